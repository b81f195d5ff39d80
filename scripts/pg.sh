#!/usr/bin/env bash
# Helpers for a private PostgreSQL cluster on 127.0.0.1, owned by the `postgres` OS user
# (initdb refuses to run as root). Sourced by start.sh and test.sh.
#   pg_ensure_installed
#   pg_up DATA_DIR PORT PASSWORD DBNAME [throwaway]   -> starts (initialising on first use)
#   pg_down DATA_DIR
#   pg_forget DATA_DIR   -> stops and deletes a cluster kept outside the checkout (see pg_dir)
set -euo pipefail

pg_bin() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1; }

ensure_apt_packages() {
  # Installs Debian packages that are missing; needs root (the project's machines run as root).
  local missing=()
  for pkg in "$@"; do dpkg -s "$pkg" >/dev/null 2>&1 || missing+=("$pkg"); done
  [ ${#missing[@]} -eq 0 ] && return 0
  echo "Installing from Debian: ${missing[*]}"
  if [ "$(id -u)" -ne 0 ]; then echo "Need root to install ${missing[*]} (or install them yourself)." >&2; return 1; fi
  if ! DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null 2>&1; then
    apt-get update -qq >/dev/null
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
  fi
}

pg_ensure_installed() {
  [ -n "$(pg_bin)" ] || ensure_apt_packages postgresql
  [ -n "$(pg_bin)" ] || { echo "PostgreSQL is not installed and could not be installed." >&2; return 1; }
}

# From / so that a working folder postgres cannot enter draws no warning.
as_postgres() { if [ "$(id -u)" -eq 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi; }

# Where the cluster for DATA_DIR really lives. Running as root, the server runs as `postgres`; when
# that user cannot enter the folders above DATA_DIR (a clone in root's home, a mode-700 temp
# folder), the cluster is kept under postgres's own home instead, one folder per DATA_DIR.
pg_dir() {
  local dir; dir="$(realpath -m "$1")"
  if [ "$(id -u)" -ne 0 ] || as_postgres test -x "$(dirname "$dir")" 2>/dev/null; then
    printf '%s\n' "$dir"
    return
  fi
  local home; home="$(getent passwd postgres | cut -d: -f6)"
  printf '%s/yokeline/%s/pg\n' "$home" "$(printf '%s' "$dir" | sha256sum | cut -c1-12)"
}

pg_up() {
  local requested port="$2" password="$3" db="$4" throwaway="${5:-}"
  requested="$(realpath -m "$1")"
  local bin; bin="$(pg_bin)"
  mkdir -p "$requested"
  local dir; dir="$(pg_dir "$requested")"
  if [ "$dir" != "$requested" ]; then
    echo "The postgres user cannot reach $(dirname "$requested"), so the database lives in $dir"
    as_postgres mkdir -p "$dir"
    rmdir "$requested" 2>/dev/null || true
  fi
  if [ ! -f "$dir/PG_VERSION" ]; then
    local pwfile; pwfile="$(mktemp -p /tmp yokeline-pw.XXXXXX)"; printf '%s' "$password" >"$pwfile"
    [ "$(id -u)" -eq 0 ] && chown -R postgres: "$dir" "$pwfile"
    chmod 700 "$dir"
    as_postgres "$bin/initdb" -D "$dir" -U app --pwfile="$pwfile" --auth=scram-sha-256 -E UTF8 \
      --locale=C.UTF-8 >/dev/null
    rm -f "$pwfile"
    {
      echo "listen_addresses = '127.0.0.1'"
      echo "port = $port"
      echo "unix_socket_directories = ''"
      echo "max_connections = 100"
      if [ -n "$throwaway" ]; then echo "fsync = off"; echo "synchronous_commit = off"; echo "full_page_writes = off"; fi
    } >>"$dir/postgresql.conf"
  fi
  if ! as_postgres "$bin/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    if (echo >"/dev/tcp/127.0.0.1/$port") 2>/dev/null; then
      echo "Port $port on 127.0.0.1 is taken by another program (another PostgreSQL?). Stop it, or choose another port with PG_PORT=…" >&2
      return 1
    fi
    as_postgres "$bin/pg_ctl" -D "$dir" -l "$dir/server.log" -o "-p $port" -w -t 30 start >/dev/null
  fi
  if ! PGPASSWORD="$password" psql -h 127.0.0.1 -p "$port" -U app -d postgres -tAc \
      "select 1 from pg_database where datname = '$db'" | grep -q 1; then
    PGPASSWORD="$password" psql -h 127.0.0.1 -p "$port" -U app -d postgres -qc "create database \"$db\"" >/dev/null
  fi
}

pg_down() {
  local dir bin; dir="$(pg_dir "$1")"; bin="$(pg_bin)"
  [ -f "$dir/PG_VERSION" ] || return 0
  as_postgres "$bin/pg_ctl" -D "$dir" -m fast -w status >/dev/null 2>&1 || return 0
  as_postgres "$bin/pg_ctl" -D "$dir" -m fast -w stop >/dev/null || true
}

pg_forget() {
  local dir; dir="$(pg_dir "$1")"
  [ "$dir" = "$(realpath -m "$1")" ] && return 0
  pg_down "$1"
  rm -rf "$(dirname "$dir")"
}

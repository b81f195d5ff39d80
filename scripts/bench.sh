#!/usr/bin/env bash
# `npm run bench`: the engineering core's speed, then API latency against a production build
# served from a throw-away database (stopped on exit).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/env.sh
source scripts/throwaway.sh

pg_ensure_installed
throwaway_up "${BENCH_PG_PORT:-54349}" yokeline_bench
export APP_PORT="${BENCH_APP_PORT:-3200}" STRIPE_FAKE_PORT="${BENCH_STRIPE_FAKE_PORT:-12311}"
export MAIL_FAKE_SMTP_PORT="${BENCH_MAIL_SMTP_PORT:-12725}" MAIL_FAKE_HTTP_PORT="${BENCH_MAIL_HTTP_PORT:-12780}"
export STRIPE_FAKE_STATE_FILE="$TMP_DIR/stripe-fake.json"
yokeline_env_local
export DATABASE_URL="$DB_BASE/yokeline_bench" BETTER_AUTH_SECRET="bench-$(head -c 24 /dev/urandom | base64 | tr -d '/+=')"
export LOG_LEVEL=warn
npx mikro-orm migration:up >/dev/null
npx tsx scripts/seed.ts >/dev/null
npx tsx bench/settle.ts
if scripts/needs-build.sh; then echo "Building…"; NODE_ENV=production npx next build >"$TMP_DIR/build.log" 2>&1 || { cat "$TMP_DIR/build.log"; exit 1; }; fi
# The same server settings as `npm start`.
NODE_OPTIONS="--max-semi-space-size=64" NODE_ENV=production setsid npx next start -H 127.0.0.1 -p "$APP_PORT" >"$TMP_DIR/app.log" 2>&1 &
APP_PID=$!
for _ in $(seq 1 60); do curl -sf "http://127.0.0.1:$APP_PORT/api/health" >/dev/null && break; sleep 0.5; done
# On 2 cores (CPUs 0 and 1) PostgreSQL is kept to the second (the app, the load tool and the bench
# may use both): left free, a query wakes its backend on the app's own core, and the app's one
# JavaScript thread waits while its database runs. BENCH_PIN=0 leaves it free; other machines are
# never pinned.
if [ "${BENCH_PIN:-1}" != 0 ] && [ "$(awk '/^Cpus_allowed_list/ {print $2}' /proc/self/status)" = 0-1 ] \
  && command -v taskset >/dev/null; then
  PG_PID="$(head -1 "$(pg_dir "$PG_DIR")/postmaster.pid")"
  for pid in "$PG_PID" $(pgrep -P "$PG_PID"); do taskset -a -p -c 1 "$pid" >/dev/null 2>&1 || true; done
  echo "PostgreSQL pinned to CPU 1 (BENCH_PIN=0 leaves it free)."
fi
BENCH_BASE_URL="http://127.0.0.1:$APP_PORT" npx tsx bench/run.ts

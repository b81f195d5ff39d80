#!/usr/bin/env bash
# `npm test`: every test, against a throw-away PostgreSQL cluster and the project's own fakes.
#  1. type check, lint and formatting;  2. Vitest (unit + integration, real PostgreSQL), with the production
#  build beside it;
#  3. Playwright in Debian's Chromium against `next start`.
# Everything it starts is stopped on exit, pass or fail.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/env.sh
source scripts/throwaway.sh

pg_ensure_installed
[ -x /usr/bin/chromium ] || ensure_apt_packages chromium
ensure_apt_packages zbar-tools poppler-utils # the traveller test renders its PDF and decodes the barcodes

PG_PORT="${TEST_PG_PORT:-54339}"
echo "▸ PostgreSQL (throw-away) on 127.0.0.1:${PG_PORT}"
throwaway_up "$PG_PORT" yokeline_test yokeline_e2e

export BETTER_AUTH_SECRET="test-secret-$(head -c 24 /dev/urandom | base64 | tr -d '/+=')"
export UPLOADS_DIR="$TMP_DIR/uploads"

# The browser tests' environment: the app and the fakes on their test ports, the e2e database.
e2e_env() {
  export APP_PORT="${TEST_APP_PORT:-3100}" STRIPE_FAKE_PORT="${TEST_STRIPE_FAKE_PORT:-12211}"
  export MAIL_FAKE_SMTP_PORT="${TEST_MAIL_SMTP_PORT:-12625}" MAIL_FAKE_HTTP_PORT="${TEST_MAIL_HTTP_PORT:-12680}"
  export STRIPE_FAKE_STATE_FILE="$TMP_DIR/stripe-fake.json"
  yokeline_env_local
  export DATABASE_URL="$DB_BASE/yokeline_e2e"
}

# The production build for the browser tests, in a subshell with the browser tests' environment
# (Vitest keeps its own). Run beside Vitest, it uses the core Vitest leaves idle (Vitest runs one
# file at a time); `nice` keeps the timing-sensitive tests ahead of it.
build() {
  (
    e2e_env
    if scripts/needs-build.sh; then
      NODE_ENV=production nice -n 10 npx next build >"$TMP_DIR/build.log" 2>&1 || { cat "$TMP_DIR/build.log"; exit 1; }
    fi
  )
}

# `npm test -- --e2e [playwright args]` runs only the browser tests (for working on them).
if [ "${1:-}" = "--e2e" ]; then
  shift
  echo "▸ Production build"
  build
else
  echo "▸ Type check"
  npx next typegen >/dev/null
  npx tsc --noEmit -p tsconfig.json
  # After the type check: both write .next/types.
  echo "▸ Production build (in the background)"
  set -m # its own process group, stopped on exit when Vitest or the lint fails first
  build &
  BUILD_PID=$!
  set +m
  # (`|| true`: under `set -e` a failed kill — the build already done — would end the trap before
  # the cluster is stopped.)
  trap '[ -n "${BUILD_PID:-}" ] && { kill -- -"$BUILD_PID" 2>/dev/null || true; }; throwaway_down' EXIT
  echo "▸ Lint (ESLint, Next's rules)"
  npx eslint . --max-warnings 0
  echo "▸ Formatting (Prettier)"
  npx prettier --check . >/dev/null || { npx prettier --check . 2>&1 | tail -20; echo "Run: npm run format"; exit 1; }

  echo "▸ Unit and integration tests (Vitest)"
  DATABASE_URL="$DB_BASE/yokeline_test" npx vitest run
  echo "▸ Waiting for the production build"
  wait "$BUILD_PID"
  BUILD_PID=
fi

e2e_env

echo "▸ Browser tests (Playwright, Chromium)"
npx mikro-orm migration:up >/dev/null
npx tsx scripts/seed.ts
npx playwright test "$@"

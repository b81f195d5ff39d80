#!/usr/bin/env bash
# Environment of a local (development or test) run: the app talks to the project's own fakes.
# Ports: app 3000, Stripe fake 12111, mail fake SMTP 12525 / HTTP 12580 (tests use others).
# Scripts run with tsx (seed, bench, the CLI, the fakes) read scripts/tsconfig.json, where `server-only`
# is an empty module: tsx has no react-server condition, and the real package throws outside it.
export TSX_TSCONFIG_PATH="$PWD/scripts/tsconfig.json"

yokeline_env_local() {
  export NEXT_TELEMETRY_DISABLED=1
  export YOKELINE_DEMO="${YOKELINE_DEMO:-1}"
  export APP_URL="http://127.0.0.1:${APP_PORT}"
  export BETTER_AUTH_URL="$APP_URL"
  export STRIPE_FAKE_PORT="${STRIPE_FAKE_PORT:-12111}"
  export STRIPE_API_HOST="127.0.0.1" STRIPE_API_PORT="$STRIPE_FAKE_PORT" STRIPE_API_PROTOCOL="http"
  export STRIPE_SECRET_KEY="${STRIPE_SECRET_KEY:-sk_test_local_fake}"
  export STRIPE_WEBHOOK_SECRET="${STRIPE_WEBHOOK_SECRET:-whsec_local_fake}"
  export STRIPE_FAKE_WEBHOOK_URL="$APP_URL/api/payments/webhook"
  # The fake keeps its sessions across restarts, so an open checkout link still works tomorrow.
  export STRIPE_FAKE_STATE_FILE="${STRIPE_FAKE_STATE_FILE:-$PWD/.data/stripe-fake.json}"
  export MAIL_FAKE_SMTP_PORT="${MAIL_FAKE_SMTP_PORT:-12525}" MAIL_FAKE_HTTP_PORT="${MAIL_FAKE_HTTP_PORT:-12580}"
  export SMTP_URL="smtp://127.0.0.1:${MAIL_FAKE_SMTP_PORT}"
  export MAIL_FAKE_URL="http://127.0.0.1:${MAIL_FAKE_HTTP_PORT}"
  export UPLOADS_DIR="${UPLOADS_DIR:-$PWD/.data/uploads}"
}

#!/usr/bin/env bash
# Exit 0 when the production build is missing or older than any source file.
cd "$(dirname "$0")/.."
[ -f .next/BUILD_ID ] || exit 0
newer=$(find app components lib entities emails public next.config.mjs tailwind.config.ts package-lock.json \
  proxy.ts instrumentation.ts instrumentation-client.ts mikro-orm.config.ts \
  -newer .next/BUILD_ID -type f 2>/dev/null | head -1)
[ -n "$newer" ]

#!/usr/bin/env bash
# npm test: the whole suite on a fresh Debian machine with Node 20 — lint, types, unit tests,
# a production build, integration tests against the real MariaDB and the built app, and
# Playwright in Debian's Chromium. Installs what is missing first. Everything on 127.0.0.1.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
started=$SECONDS

require_node
ensure_node_modules
ensure_debian chromium chromium
ensure_debian ffmpeg ffmpeg
# A server this run starts, this run stops (a demo server that was already up stays up).
if ! bash scripts/mariadb.sh status; then
  trap 'bash scripts/mariadb.sh stop >/dev/null 2>&1 || true' EXIT
fi
bash scripts/mariadb.sh start
export TZ=UTC NEXT_TELEMETRY_DISABLED=1
# The tests run the demo (seeded accounts, demo mailbox) and ask for it; the app's default is live.
export PLUMBLINE_MODE=demo
export NEXT_DIST_DIR=.next-test
mkdir -p .data

say "lint and types"
node_modules/.bin/biome check .
node_modules/.bin/tsc --noEmit

say "unit tests"
node_modules/.bin/vitest run --project unit

if build_is_stale "$NEXT_DIST_DIR"; then
  say "building the app for the tests (next build --webpack)"
  node_modules/.bin/next build --webpack >.data/test-build.log 2>&1 || { tail -60 .data/test-build.log; exit 1; }
  record_build "$NEXT_DIST_DIR"
else
  say "test build is up to date"
fi

say "integration tests (MariaDB + the built app)"
node_modules/.bin/vitest run --project integration

say "browser tests (Playwright, Debian Chromium)"
bash scripts/e2e.sh

say "all suites passed in $((SECONDS - started)) s"

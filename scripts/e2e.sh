#!/usr/bin/env bash
# The browser-test part of `npm test`, on its own: a fresh demo database, the service fakes and
# `next start` of the test build (Playwright starts those two), then Playwright in Debian's
# Chromium. Arguments go to `playwright test` (e.g. a spec file). Expects the test build to exist.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
export TZ=UTC NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-test}" NEXT_TELEMETRY_DISABLED=1
# The browser tests run the demo and ask for it (the app's default is live).
export PLUMBLINE_MODE=demo
E2E_DB="$(node_modules/.bin/tsx scripts/e2e-database.ts create)"
trap 'node_modules/.bin/tsx scripts/e2e-database.ts drop "$E2E_DB" || true' EXIT
export PLUMBLINE_E2E_APP_PORT="${PLUMBLINE_E2E_APP_PORT:-3300}"
export DATABASE_URL="$E2E_DB"
export APP_URL="http://127.0.0.1:$PLUMBLINE_E2E_APP_PORT"
# Ports apart from the demo and the integration tests; override to run two checkouts side by side.
export SMTP_PORT="${PLUMBLINE_E2E_SMTP_PORT:-2725}"
export MAILBOX_URL="http://127.0.0.1:${PLUMBLINE_E2E_MAILBOX_PORT:-2780}"
export S3_ENDPOINT="http://127.0.0.1:${PLUMBLINE_E2E_S3_PORT:-4768}"
export PAYMENTS_URL="http://127.0.0.1:${PLUMBLINE_E2E_PAYMENTS_PORT:-4770}"
export PLUMBLINE_SERVICES_DIR="$ROOT/.data/test-services/e2e"
rm -rf "$PLUMBLINE_SERVICES_DIR"
node_modules/.bin/playwright test "$@"

#!/usr/bin/env bash
# npm start: everything a fresh Debian machine with Node 20 needs, then the app on 127.0.0.1:3000.
# Installs what is missing (npm packages, MariaDB), starts MariaDB and the local service fakes on
# loopback, applies migrations, seeds the demo when the database is empty, builds when the code
# changed, starts the job worker and serves. Ctrl-C stops the app, the worker and the fakes;
# MariaDB keeps running for next time
# (`npm run db:down` stops it).
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

require_node
ensure_node_modules
bash scripts/mariadb.sh start
mkdir -p .data

export PORT="${PORT:-3000}" NEXT_TELEMETRY_DISABLED=1
# npm start is the demo: it asks for it (the app's default is live), which gives the published
# AUTH_SECRET, the demo accounts and the /demo pages. A live deployment runs `next start` itself.
export PLUMBLINE_MODE=demo
export APP_URL="${APP_URL:-http://127.0.0.1:$PORT}"
# A fake clock (demo only) is read alike by the app and the worker: both start it from now.
if [ -n "${PLUMBLINE_FAKE_NOW:-}" ]; then export PLUMBLINE_FAKE_NOW_SINCE="${PLUMBLINE_FAKE_NOW_SINCE:-$(date +%s%3N)}"; fi

node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx scripts/seed.ts

if build_is_stale .next; then
  say "building the app (next build --webpack, about a minute)"
  node_modules/.bin/next build --webpack >.data/build.log 2>&1 || { tail -40 .data/build.log; exit 1; }
  record_build .next
else
  say "build is up to date"
fi

node_modules/.bin/tsx scripts/services.ts &
SERVICES_PID=$!
# The job worker: re-derives verdicts after a sync and sends the e-mail, off the request path.
node_modules/.bin/tsx --conditions=react-server scripts/worker.ts &
WORKER_PID=$!
trap 'kill "$SERVICES_PID" "$WORKER_PID" 2>/dev/null || true' EXIT INT TERM
mailbox_port="${MAILBOX_URL:-http://127.0.0.1:2580}"; mailbox_port="${mailbox_port##*:}"; mailbox_port="${mailbox_port%%/*}"
s3_port="${S3_ENDPOINT:-http://127.0.0.1:4568}"; s3_port="${s3_port##*:}"; s3_port="${s3_port%%/*}"
payments_port="${PAYMENTS_URL:-http://127.0.0.1:4570}"; payments_port="${payments_port##*:}"; payments_port="${payments_port%%/*}"
wait_port "${SMTP_PORT:-2525}" && wait_port "$mailbox_port" && wait_port "$s3_port" && wait_port "$payments_port" || { say "local service fakes did not start"; exit 1; }

say "Plumbline on $APP_URL — demo accounts are in README.md (Ctrl-C to stop)"
node_modules/.bin/next start -H 127.0.0.1 -p "$PORT"

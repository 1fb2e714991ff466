#!/usr/bin/env bash
# npm run bench [-- --tiny] [-- --out DIR]: the benchmark figures (README, Benchmarks). Uses the
# MariaDB on PLUMBLINE_DB_PORT if one answers there (else starts the project's and stops it
# afterwards), builds the test build if it is stale, then runs scripts/bench/run-bench.ts, which
# starts and stops everything else it needs on 127.0.0.1.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

require_node
ensure_node_modules
export TZ=UTC NEXT_TELEMETRY_DISABLED=1 PLUMBLINE_MODE=demo
export NEXT_DIST_DIR="${NEXT_DIST_DIR:-.next-test}"
mkdir -p .data

if ! wait_port "${PLUMBLINE_DB_PORT:-3307}" 1; then
  trap 'bash scripts/mariadb.sh stop >/dev/null 2>&1 || true' EXIT
  bash scripts/mariadb.sh start
fi

if build_is_stale "$NEXT_DIST_DIR"; then
  say "building the app for the bench (next build --webpack into $NEXT_DIST_DIR)"
  node_modules/.bin/next build --webpack >.data/bench-build.log 2>&1 || { tail -60 .data/bench-build.log; exit 1; }
  record_build "$NEXT_DIST_DIR"
fi

node_modules/.bin/tsx scripts/bench/run-bench.ts "$@"

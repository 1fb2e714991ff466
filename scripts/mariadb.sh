#!/usr/bin/env bash
# Plumbline's own MariaDB (Debian's packages) on 127.0.0.1, with a private data directory.
#   scripts/mariadb.sh start           install if missing, init, start (or reuse), create db + app user
#   scripts/mariadb.sh stop            shut our server down cleanly
#   scripts/mariadb.sh status          exit 0 when our server answers
#   scripts/mariadb.sh sql "<SQL>"     run SQL as root over the private socket
#   scripts/mariadb.sh reset           drop and re-create the app database (empty; demo only)
# Settings: PLUMBLINE_DB_PORT (3307), PLUMBLINE_DB_NAME (plumbline),
#           PLUMBLINE_DB_USER (plumbline), PLUMBLINE_DB_PASSWORD (plumbline-demo).
set -euo pipefail

ROOT="$(cd "$(dirname "$0")/.." && pwd)"
PORT="${PLUMBLINE_DB_PORT:-3307}"
NAME="${PLUMBLINE_DB_NAME:-plumbline}"
USER_NAME="${PLUMBLINE_DB_USER:-plumbline}"
PASSWORD="${PLUMBLINE_DB_PASSWORD:-plumbline-demo}"
BASE="$ROOT/.data/mariadb-$PORT"
DATA="$BASE/data"
PID="$BASE/mariadbd.pid"
LOG="$BASE/mariadbd.log"
SOCK="$BASE/mariadbd.sock"
# A unix socket path must stay under ~107 bytes; deep checkouts fall back to /tmp.
if [ "${#SOCK}" -gt 100 ]; then
  SOCK="/tmp/plumbline-$(printf '%s' "$BASE" | md5sum | cut -c1-12).sock"
fi

log() { printf '[mariadb] %s\n' "$*"; }

as_root() { if [ "$(id -u)" -eq 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else
  log "need root (or sudo) to install Debian packages: $*"; exit 1; fi; }

ensure_installed() {
  if command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ]; then return; fi
  log "installing mariadb-server and mariadb-client from Debian (first run only, ~30 s)"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq mariadb-server mariadb-client >/dev/null
}

mariadbd_bin() { command -v mariadbd 2>/dev/null || echo /usr/sbin/mariadbd; }

ping_ok() { mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; }

running() { [ -f "$PID" ] && kill -0 "$(cat "$PID")" 2>/dev/null && ping_ok; }

root_sql() { mariadb --no-defaults --socket="$SOCK" -uroot -e "$1"; }

port_busy() { (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; }

start() {
  ensure_installed
  mkdir -p "$BASE"
  if running; then
    log "reusing the running server on 127.0.0.1:$PORT"
  else
    if port_busy; then
      log "port $PORT on 127.0.0.1 is taken by another server; set PLUMBLINE_DB_PORT to a free port"
      exit 1
    fi
    if [ ! -d "$DATA/mysql" ]; then
      log "initialising a private data directory in $DATA"
      mariadb-install-db --no-defaults --user="$(id -un)" --datadir="$DATA" \
        --auth-root-authentication-method=normal --skip-test-db >"$BASE/install.log" 2>&1
    fi
    rm -f "$SOCK"
    nohup "$(mariadbd_bin)" --no-defaults --user="$(id -un)" --datadir="$DATA" --socket="$SOCK" \
      --pid-file="$PID" --port="$PORT" --bind-address=127.0.0.1 --log-error="$LOG" \
      --skip-name-resolve --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
      --max-connections=300 >/dev/null 2>&1 &
    for _ in $(seq 1 150); do ping_ok && break; sleep 0.2; done
    if ! ping_ok; then log "server did not answer within 30 s; see $LOG"; tail -20 "$LOG" || true; exit 1; fi
    log "started on 127.0.0.1:$PORT (data: $DATA)"
  fi
  root_sql "CREATE DATABASE IF NOT EXISTS \`$NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    CREATE USER IF NOT EXISTS '$USER_NAME'@'127.0.0.1' IDENTIFIED BY '$PASSWORD';
    CREATE USER IF NOT EXISTS '$USER_NAME'@'localhost' IDENTIFIED BY '$PASSWORD';
    GRANT ALL PRIVILEGES ON \`$NAME\`.* TO '$USER_NAME'@'127.0.0.1', '$USER_NAME'@'localhost';
    GRANT ALL PRIVILEGES ON \`${NAME}\\_test\\_%\`.* TO '$USER_NAME'@'127.0.0.1', '$USER_NAME'@'localhost';
    FLUSH PRIVILEGES;"
}

stop() {
  if running; then
    mariadb-admin --no-defaults --socket="$SOCK" -uroot shutdown
    log "stopped"
  else
    log "not running"
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) running ;;
  sql) running && root_sql "$2" ;;
  reset) start && root_sql "DROP DATABASE IF EXISTS \`$NAME\`;" && start ;;
  *) echo "usage: $0 start|stop|status|reset|sql <SQL>" >&2; exit 2 ;;
esac

# Shared shell helpers for scripts/start.sh and scripts/test.sh.
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"

say() { printf '[plumbline] %s\n' "$*"; }

as_root() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else
    say "need root (or sudo) for: $*"; exit 1; fi
}

require_node() {
  local major
  major="$(node -p 'process.versions.node.split(".")[0]' 2>/dev/null || echo 0)"
  if [ "$major" -lt 20 ]; then say "Node 20 or newer is needed (found $(node -v 2>/dev/null || echo none))"; exit 1; fi
}

# npm ci when node_modules is missing or older than the lock file.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.plumbline-lock-sha"
  local want
  want="$(sha256sum "$ROOT/package-lock.json" | cut -c1-64)"
  if [ ! -f "$stamp" ] || [ "$(cat "$stamp")" != "$want" ]; then
    say "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    echo "$want" >"$stamp"
  fi
}

# Debian packages by command name: ensure_debian <command> <package>...
ensure_debian() {
  local cmd="$1"; shift
  if command -v "$cmd" >/dev/null 2>&1; then return; fi
  say "installing $* from Debian (first run only)"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

# Wait for a TCP port on 127.0.0.1, up to N tenths of a second.
wait_port() {
  local port="$1" tries="${2:-300}"
  for _ in $(seq 1 "$tries"); do
    (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null && return 0
    sleep 0.1
  done
  return 1
}

# Both builds (the demo's .next, the tests' .next-test) write the one public/sw.js, whose
# precache list names that build's files: a build is only current if the service worker is its own.
sw_hash() { sha256sum "$ROOT/public/sw.js" 2>/dev/null | cut -c1-64; }
record_build() { sw_hash >"$ROOT/$1/.plumbline-sw-sha"; }

# The newest source change is newer than the last build, or the service worker is another build's?
build_is_stale() {
  local dist="$1"
  [ -f "$ROOT/$dist/BUILD_ID" ] || return 0
  [ "$(cat "$ROOT/$dist/.plumbline-sw-sha" 2>/dev/null)" = "$(sw_hash)" ] || return 0
  [ -n "$(cd "$ROOT" && find app components lib db public auth.ts auth.config.ts proxy.ts next.config.ts instrumentation-client.ts \
    tailwind.config.ts postcss.config.mjs package-lock.json -newer "$dist/BUILD_ID" -type f \
    -not -name 'sw.js' -not -name 'swe-worker-*' -print -quit 2>/dev/null)" ]
}

# Shared by the project's shell scripts: paths, defaults and small helpers. Source it, don't run it.
ZW_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
ZW_DATA="$ZW_ROOT/.data"
mkdir -p "$ZW_DATA/run" "$ZW_DATA/log"

export PGPORT="${PGPORT:-54329}"

zw_say() { printf '[zonewright] %s\n' "$*"; }
zw_fail() { printf '[zonewright] error: %s\n' "$*" >&2; exit 1; }

# True when something accepts TCP connections on 127.0.0.1:$1.
zw_port_open() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# Wait up to $2 seconds (default 60) for 127.0.0.1:$1 to accept connections.
zw_wait_port() {
  local port="$1" limit="${2:-60}" waited=0
  until zw_port_open "$port"; do
    sleep 0.5; waited=$((waited + 1))
    if [ "$waited" -ge $((limit * 2)) ]; then return 1; fi
  done
}

# Install Debian packages only when a command or file is missing: zw_apt_need <path-or-command> <package>...
zw_apt_need() {
  local probe="$1"; shift
  if [ -e "$probe" ] || command -v "$probe" >/dev/null 2>&1; then return 0; fi
  zw_apt_install "$@"
}

zw_apt_install() {
  zw_say "installing $* (Debian packages)"
  local sudo=""
  [ "$(id -u)" -eq 0 ] || sudo="sudo"
  if [ -z "${ZW_APT_UPDATED:-}" ]; then
    $sudo apt-get update -qq >/dev/null || zw_fail "apt-get update failed"
    export ZW_APT_UPDATED=1
  fi
  DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq "$@" >/dev/null || zw_fail "apt-get install $* failed"
}

zw_node_modules() {
  if [ ! -d "$ZW_ROOT/node_modules/.bin" ]; then
    zw_say "installing npm dependencies (npm ci)"
    (cd "$ZW_ROOT" && npm ci --no-audit --no-fund) || zw_fail "npm ci failed"
  fi
}

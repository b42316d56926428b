# One function per background service. up.sh and test.sh call them; down.sh stops what they started.
# Each service writes its pid to $ZW_DATA/run/<name>.pid and its log to $ZW_DATA/log/<name>.log.
# Adding a service (e.g. the job worker) is one function here and one line in up.sh and test.sh.
# shellcheck source=common.sh
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

# Start a node process in the background unless its pid file names a live one.
# zw_service_start <name> <port-or-empty> <command...>
zw_service_start() {
  local name="$1" port="$2"; shift 2
  local pidfile="$ZW_DATA/run/$name.pid" log="$ZW_DATA/log/$name.log"
  if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then
    zw_say "$name already running (pid $(cat "$pidfile"))"
    return 0
  fi
  if [ -n "$port" ] && zw_port_open "$port"; then
    zw_fail "port $port (for $name) is taken by another program; stop it or choose another port"
  fi
  (cd "$ZW_ROOT" && exec setsid "$@" >>"$log" 2>&1) &
  echo $! >"$pidfile"
  if [ -n "$port" ]; then
    if ! zw_wait_port "$port" 120; then
      tail -n 30 "$log" >&2
      zw_fail "$name did not start listening on port $port (log: $log)"
    fi
  fi
  zw_say "$name started (pid $(cat "$pidfile"), log .data/log/$name.log)"
}

# Stop a service started by zw_service_start: its whole process group, then wait.
zw_service_stop() {
  local name="$1" pidfile="$ZW_DATA/run/$1.pid"
  [ -f "$pidfile" ] || return 0
  local pid; pid="$(cat "$pidfile")"
  if kill -0 "$pid" 2>/dev/null; then
    kill -TERM -- "-$pid" 2>/dev/null || kill -TERM "$pid" 2>/dev/null
    for _ in $(seq 1 40); do kill -0 "$pid" 2>/dev/null || break; sleep 0.25; done
    kill -KILL -- "-$pid" 2>/dev/null || true
    zw_say "$name stopped"
  fi
  rm -f "$pidfile"
}

# The local SMTP fake; every message lands in the captured_mail table of $DATABASE_URL.
zw_start_mail() { zw_service_start "mail-fake${1:+-$1}" "$SMTP_PORT" "$ZW_ROOT/node_modules/.bin/tsx" scripts/mail-fake.ts; }

# The built Next.js app on 127.0.0.1:$PORT.
zw_start_app() { zw_service_start "app${1:+-$1}" "$PORT" "$ZW_ROOT/node_modules/.bin/next" start -H 127.0.0.1 -p "$PORT"; }

# The export worker (pg-boss queues in $DATABASE_URL); no port, it only talks to PostgreSQL.
zw_start_worker() { zw_service_start "worker${1:+-$1}" "" "$ZW_ROOT/node_modules/.bin/tsx" scripts/worker.ts; }

# All services a run has, in start order; a suffix (e.g. "test") keeps test services apart from `up`'s.
zw_start_services() { zw_start_mail "${1:-}"; zw_start_worker "${1:-}"; zw_start_app "${1:-}"; }
zw_stop_services() { zw_service_stop "app${1:+-$1}"; zw_service_stop "worker${1:+-$1}"; zw_service_stop "mail-fake${1:+-$1}"; }

# One function per background service. up.sh and test.sh start them all with zw_start_services;
# down.sh and test.sh's cleanup stop them with zw_stop_services (in reverse order).
# Each service writes its pid to .data/run/<name>.pid and its log to .data/log/<name>.log; a suffix
# (e.g. "test") keeps the test run's services apart from those of `npm run up`.
# Adding a service: write zw_start_<name> below and add <name> to ZW_SERVICES.
# shellcheck source=common.sh
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

# Start a process in the background (own process group) unless its pid file names a live one.
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
  : >"$log"
  (cd "$ZW_ROOT" && exec setsid "$@" >>"$log" 2>&1) &
  echo $! >"$pidfile"
  if [ -n "$port" ] && ! zw_wait_port "$port" 120; then
    tail -n 30 "$log" >&2
    zw_fail "$name did not start listening on port $port (log: .data/log/$name.log)"
  fi
  zw_say "$name started (pid $(cat "$pidfile"), log .data/log/$name.log)"
}

# Stop a service started by zw_service_start: TERM to its process group, KILL after 10 s.
zw_service_stop() {
  local name="$1" pidfile="$ZW_DATA/run/$1.pid"
  [ -f "$pidfile" ] || return 0
  local pid; pid="$(cat "$pidfile")"
  if kill -0 "$pid" 2>/dev/null; then
    kill -TERM -- "-$pid" 2>/dev/null || kill -TERM "$pid" 2>/dev/null || true
    for _ in $(seq 1 40); do kill -0 "$pid" 2>/dev/null || break; sleep 0.25; done
    kill -KILL -- "-$pid" 2>/dev/null || true
    zw_say "$name stopped"
  fi
  rm -f "$pidfile"
}

# The local SMTP fake on 127.0.0.1:$SMTP_PORT; every message lands in captured_mail of $DATABASE_URL.
zw_start_mail() { zw_service_start "mail-fake${1:+-$1}" "$SMTP_PORT" "$ZW_ROOT/node_modules/.bin/tsx" scripts/mail-fake.ts; }
zw_stop_mail() { zw_service_stop "mail-fake${1:+-$1}"; }

# The background job worker (pg-boss), once scripts/worker.ts exists.
zw_start_worker() { zw_service_start "worker${1:+-$1}" "" "$ZW_ROOT/node_modules/.bin/tsx" scripts/worker.ts; }
zw_stop_worker() { zw_service_stop "worker${1:+-$1}"; }

# The built Next.js app on 127.0.0.1:$PORT.
zw_start_app() { zw_service_start "app${1:+-$1}" "$PORT" "$ZW_ROOT/node_modules/.bin/next" start -H 127.0.0.1 -p "$PORT"; }
zw_stop_app() { zw_service_stop "app${1:+-$1}"; }

# Start order; stopped in reverse.
ZW_SERVICES=(mail)
[ -f "$ZW_ROOT/scripts/worker.ts" ] && ZW_SERVICES+=(worker)
ZW_SERVICES+=(app)

zw_start_services() {
  local service
  for service in "${ZW_SERVICES[@]}"; do "zw_start_$service" "${1:-}"; done
}

zw_stop_services() {
  local i
  for ((i = ${#ZW_SERVICES[@]} - 1; i >= 0; i--)); do "zw_stop_${ZW_SERVICES[i]}" "${1:-}"; done
}

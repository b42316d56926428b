#!/usr/bin/env bash
# The project-local PostgreSQL cluster: bash scripts/pg.sh start|stop|status|psql [args]
# Data in .data/pg (owned by the `postgres` OS user, since PostgreSQL refuses to run as root),
# listening on 127.0.0.1:$PGPORT only. Start is idempotent and survives a stale postmaster.pid.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib/common.sh"

PG_USER_OS=postgres
PG_ROLE=zonewright
PG_PASSWORD=zonewright

pg_bin() {
  local found
  found="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
  if [ -z "$found" ] || [ ! -x "$found/initdb" ]; then
    zw_apt_install postgresql
    found="$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1)"
  fi
  echo "$found"
}

# The postgres user must reach the data folder; a checkout under /root is not reachable,
# so the cluster then lives under /var/lib/postgresql, keyed by the checkout's path.
pg_data_dir() {
  if [ -n "${ZW_PGDATA:-}" ]; then echo "$ZW_PGDATA"; return; fi
  if as_postgres test -x "$ZW_DATA" 2>/dev/null; then echo "$ZW_DATA/pg"; return; fi
  local key; key="$(printf '%s' "$ZW_ROOT" | sha1sum | cut -c1-12)"
  echo "/var/lib/postgresql/zonewright-$key"
}

# From / so the postgres user is not left in a folder it may not enter.
as_postgres() {
  if [ "$(id -un)" = "$PG_USER_OS" ]; then (cd / && "$@")
  elif [ "$(id -u)" -eq 0 ]; then (cd / && runuser -u "$PG_USER_OS" -- "$@")
  else (cd / && sudo -u "$PG_USER_OS" -- "$@")
  fi
}

ensure_os_user() {
  id "$PG_USER_OS" >/dev/null 2>&1 && return 0
  zw_apt_install postgresql
}

init_cluster() {
  local bin="$1" data="$2"
  [ -f "$data/PG_VERSION" ] && return 0
  zw_say "creating the project cluster in $data"
  mkdir -p "$data"
  chown "$PG_USER_OS:" "$data"
  chmod 700 "$data"
  local pwfile; pwfile="$(mktemp)"
  printf '%s\n' "$PG_PASSWORD" >"$pwfile"
  chown "$PG_USER_OS:" "$pwfile"
  as_postgres "$bin/initdb" -D "$data" -U "$PG_ROLE" --pwfile="$pwfile" \
    --auth-local=scram-sha-256 --auth-host=scram-sha-256 -E UTF8 --locale=C.UTF-8 >/dev/null \
    || { rm -f "$pwfile"; zw_fail "initdb failed"; }
  rm -f "$pwfile"
}

# True when the data folder's postmaster.pid names a live postgres serving this data folder.
cluster_running() {
  local data="$1" pid
  [ -f "$data/postmaster.pid" ] || return 1
  pid="$(head -n 1 "$data/postmaster.pid")"
  [ -n "$pid" ] && [ -r "/proc/$pid/cmdline" ] || return 1
  tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q -- "$data"
}

cluster_port() { sed -n 4p "$1/postmaster.pid"; }

start() {
  ensure_os_user
  local bin data; bin="$(pg_bin)"; data="$(pg_data_dir)"
  init_cluster "$bin" "$data"
  if cluster_running "$data"; then
    local port; port="$(cluster_port "$data")"
    [ "$port" = "$PGPORT" ] || zw_fail "the project cluster is already running on port $port, not $PGPORT; run 'bash scripts/pg.sh stop' first"
    zw_say "PostgreSQL already running on 127.0.0.1:$PGPORT"
    return 0
  fi
  if [ -f "$data/postmaster.pid" ]; then
    zw_say "removing a stale postmaster.pid (the cluster was not shut down cleanly)"
    rm -f "$data/postmaster.pid"
  fi
  if zw_port_open "$PGPORT"; then
    zw_fail "port $PGPORT is taken by another program; stop it or set PGPORT to a free port"
  fi
  # The server writes its own log, so it must sit where the postgres user can reach.
  local log="$ZW_DATA/log/postgres.log"
  case "$data" in "$ZW_DATA"/*) ;; *) log="$data.log" ;; esac
  touch "$log"; chown "$PG_USER_OS:" "$log"
  # No Unix socket: TCP on loopback only keeps this cluster apart from any system one.
  as_postgres "$bin/pg_ctl" -D "$data" -l "$log" -w -t 60 \
    -o "-c listen_addresses=127.0.0.1 -p $PGPORT -c unix_socket_directories=''" start >/dev/null \
    || { tail -n 20 "$log" >&2; zw_fail "PostgreSQL did not start (log: $log)"; }
  zw_say "PostgreSQL running on 127.0.0.1:$PGPORT (data: $data)"
}

stop() {
  local bin data; bin="$(pg_bin)"; data="$(pg_data_dir)"
  if cluster_running "$data"; then
    as_postgres "$bin/pg_ctl" -D "$data" -m fast -w stop >/dev/null
    zw_say "PostgreSQL stopped"
  else
    zw_say "PostgreSQL was not running"
  fi
}

status() {
  local data; data="$(pg_data_dir)"
  if cluster_running "$data"; then zw_say "PostgreSQL running on 127.0.0.1:$(cluster_port "$data") (data: $data)"
  else zw_say "PostgreSQL not running (data: $data)"; return 3
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  psql) shift; PGPASSWORD="$PG_PASSWORD" exec "$(pg_bin)/psql" -h 127.0.0.1 -p "$PGPORT" -U "$PG_ROLE" "${@:-zonewright}" ;;
  *) echo "usage: bash scripts/pg.sh start|stop|status|psql [database]" >&2; exit 2 ;;
esac

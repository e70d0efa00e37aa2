#!/usr/bin/env bash
# The project's private PostgreSQL cluster: install (Debian package), init, start, stop, status, reset.
#   scripts/pg.sh start|stop|status|reset|url [DBNAME]|createdb DBNAME|dropdb DBNAME|psql [ARGS]|datadir
# Listens on 127.0.0.1 over TCP only (no Unix socket: deep checkout paths exceed the 107-byte limit).
# PostgreSQL refuses to run as root, so as root every server command runs as the `postgres` system user.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
PGPORT="${GLASSGRADE_PG_PORT:-54329}"
PGHOST=127.0.0.1

log() { echo "[pg] $*" >&2; }

as_root() { if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo "$@"; fi; }

pg_bindir() {
  local v
  v="$(ls /usr/lib/postgresql 2>/dev/null | sort -V | tail -1 || true)"
  [ -n "$v" ] && [ -x "/usr/lib/postgresql/$v/bin/initdb" ] && echo "/usr/lib/postgresql/$v/bin"
}

ensure_installed() {
  if [ -z "$(pg_bindir || true)" ]; then
    log "PostgreSQL server not found; installing Debian's postgresql package"
    as_root apt-get update -qq
    # The package may also create its own default cluster on port 5432; ours is separate and private.
    as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  fi
  BIN="$(pg_bindir)"
  if [ "$(id -u)" -eq 0 ] && ! id -u postgres >/dev/null 2>&1; then
    useradd --system --no-create-home --shell /usr/sbin/nologin postgres
  fi
}

# As root, server commands run as `postgres`; as anyone else, as themselves.
run_pg() {
  # From / because the checkout may not be readable by `postgres`.
  if [ "$(id -u)" -eq 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

# One place decides where the data lives, so start, test and stop agree.
data_dir() {
  if [ -n "${GLASSGRADE_PGDATA:-}" ]; then echo "$GLASSGRADE_PGDATA"; return; fi
  if [ "$(id -u)" -ne 0 ] || runuser -u postgres -- test -x "$ROOT" 2>/dev/null; then
    echo "$ROOT/.data/pg"
  else
    # The checkout is not reachable by `postgres` (e.g. a clone under /root): keep the cluster outside it.
    local h
    h="$(printf '%s' "$ROOT" | sha256sum | cut -c1-12)"
    echo "/var/tmp/glassgrade-$h/pg"
  fi
}

PGDATA="$(data_dir)"

prepare_dir() {
  mkdir -p "$PGDATA"
  if [ "$(id -u)" -eq 0 ]; then chown postgres: "$PGDATA" "$(dirname "$PGDATA")" 2>/dev/null || chown postgres: "$PGDATA"; fi
  chmod 700 "$PGDATA"
}

# The server counts as running only if the pid in its pid file is a live (not zombie) postgres process.
# pg_ctl's own check is fooled after a kill -9 when nobody reaps the dead postmaster (containers whose
# init does not reap), and by a pid reused by another program.
server_pid_alive() {
  local pidfile="$PGDATA/postmaster.pid" pid state
  [ -f "$pidfile" ] || return 1
  pid="$(head -1 "$pidfile" 2>/dev/null || true)"
  [ -n "$pid" ] && [ -r "/proc/$pid/stat" ] || return 1
  grep -q postgres "/proc/$pid/comm" 2>/dev/null || return 1
  state="$(sed 's/^.*) //' "/proc/$pid/stat" | cut -d' ' -f1)"
  [ "$state" != "Z" ]
}

is_running() { server_pid_alive; }

# After a kill -9 the pid file stays behind; postgres would refuse to start while its pid looks alive.
clear_stale_pid() {
  local pidfile="$PGDATA/postmaster.pid"
  [ -f "$pidfile" ] || return 0
  server_pid_alive && return 0
  log "removing stale pid file (pid $(head -1 "$pidfile" 2>/dev/null || echo '?') is gone)"
  rm -f "$pidfile"
}

start() {
  ensure_installed
  prepare_dir
  if [ ! -f "$PGDATA/PG_VERSION" ]; then
    log "initialising a private cluster in $PGDATA"
    run_pg "$BIN/initdb" -D "$PGDATA" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if is_running; then
    log "already running on $PGHOST:$PGPORT ($PGDATA)"
  else
    clear_stale_pid
    local try
    for try in 1 2 3 4 5; do
      if run_pg "$BIN/pg_ctl" -D "$PGDATA" -l "$PGDATA/server.log" -w -t 30 \
        -o "-p $PGPORT -h $PGHOST -c unix_socket_directories='' -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" \
        start >/dev/null; then
        break
      fi
      # Orphaned backends of a killed server can hold shared memory for a moment; wait and retry.
      log "start attempt $try failed; retrying (see $PGDATA/server.log)"
      sleep 2
      clear_stale_pid
      [ "$try" -eq 5 ] && { tail -20 "$PGDATA/server.log" >&2; exit 1; }
    done
    log "started on $PGHOST:$PGPORT ($PGDATA)"
  fi
  local i
  for i in $(seq 1 60); do
    if "$BIN/pg_isready" -q -h "$PGHOST" -p "$PGPORT"; then return 0; fi
    sleep 0.5
  done
  log "server did not accept connections in time"; exit 1
}

stop() {
  BIN="$(pg_bindir || true)"
  [ -n "$BIN" ] && [ -f "$PGDATA/PG_VERSION" ] || { log "no cluster"; return 0; }
  if is_running; then run_pg "$BIN/pg_ctl" -D "$PGDATA" -m fast -w stop >/dev/null; log "stopped"; else log "not running"; fi
}

psql_cmd() { "$BIN/psql" -X -q -v ON_ERROR_STOP=1 -h "$PGHOST" -p "$PGPORT" -U postgres "$@"; }

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) BIN="$(pg_bindir || true)"; if [ -n "$BIN" ] && is_running; then echo "running on $PGHOST:$PGPORT ($PGDATA)"; else echo "not running ($PGDATA)"; exit 3; fi ;;
  reset) stop; log "deleting $PGDATA"; rm -rf "$PGDATA"; start ;;
  url) echo "postgres://postgres@$PGHOST:$PGPORT/${2:-glassgrade}" ;;
  datadir) echo "$PGDATA" ;;
  createdb) ensure_installed; [ -n "${2:-}" ] || { log "createdb needs a name"; exit 2; }
    if [ "$(psql_cmd -d postgres -tAc "select 1 from pg_database where datname='$2'")" != "1" ]; then psql_cmd -d postgres -c "create database \"$2\"" && log "created database $2"; fi ;;
  dropdb) ensure_installed; [ -n "${2:-}" ] || { log "dropdb needs a name"; exit 2; }
    psql_cmd -d postgres -c "drop database if exists \"$2\" with (force)" ;;
  psql) ensure_installed; shift; psql_cmd -d "${GLASSGRADE_DB:-glassgrade}" "$@" ;;
  *) echo "usage: $0 start|stop|status|reset|url [db]|createdb DB|dropdb DB|psql [args]|datadir" >&2; exit 2 ;;
esac

#!/usr/bin/env bash
# A project-local PostgreSQL cluster on loopback: start | stop | status | createdb NAME | dropdb NAME.
# Data lives in .data/pg (git-ignored). PostgreSQL refuses to run as root, so as root the cluster is owned by
# the unprivileged `postgres` OS user (created when missing). Idempotent: start finds a running server.
# When DATABASE_URL is set, everything points at that server instead and this script does nothing.
set -euo pipefail

cd "$(dirname "$0")/.."
PORT="${BRANCHLINE_PG_PORT:-55432}"
PGDIR="$PWD/.data/pg"
DATA="$PGDIR/data"

log() { echo "[pg] $*" >&2; }

find_bin() {
  local dir
  for dir in /usr/lib/postgresql/*/bin; do
    [ -x "$dir/pg_ctl" ] && { echo "$dir"; return 0; }
  done
  return 1
}

ensure_binaries() {
  if ! PGBIN=$(find_bin); then
    log "PostgreSQL server binaries missing; installing Debian's postgresql package"
    if [ "$(id -u)" -ne 0 ]; then log "need root to install postgresql (apt-get install -y postgresql)"; exit 1; fi
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
    PGBIN=$(find_bin)
  fi
}

# Run a command as the cluster's owner: `postgres` when we are root, ourselves otherwise.
as_owner() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

ensure_cluster() {
  if [ "$(id -u)" -eq 0 ]; then
    id postgres >/dev/null 2>&1 || useradd --system --no-create-home --shell /usr/sbin/nologin postgres
    # Every parent of the data directory must be traversable by postgres.
    local d="$PGDIR"
    while [ "$d" != "/" ]; do chmod o+x "$d" 2>/dev/null || true; d=$(dirname "$d"); done
  fi
  mkdir -p "$PGDIR"
  [ "$(id -u)" -eq 0 ] && chown postgres:postgres "$PGDIR"
  if [ ! -f "$DATA/PG_VERSION" ]; then
    log "creating cluster in .data/pg"
    as_owner "$PGBIN/initdb" -D "$DATA" -U postgres -A trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
}

is_running() { "$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$PORT" >/dev/null 2>&1; }

psql_admin() { "$PGBIN/psql" -X -q -v ON_ERROR_STOP=1 -h 127.0.0.1 -p "$PORT" -U postgres -d postgres "$@"; }

start() {
  ensure_binaries
  ensure_cluster
  if is_running; then log "already running on 127.0.0.1:$PORT"; return 0; fi
  as_owner "$PGBIN/pg_ctl" -D "$DATA" -l "$PGDIR/server.log" -w -t 30 \
    -o "-c listen_addresses=127.0.0.1 -p $PORT -c unix_socket_directories=$PGDIR -c fsync=off" start >/dev/null
  for _ in $(seq 1 60); do is_running && break; sleep 0.5; done
  is_running || { log "server did not accept connections; see .data/pg/server.log"; exit 1; }
  log "running on 127.0.0.1:$PORT"
}

stop() {
  PGBIN=$(find_bin) || return 0
  [ -f "$DATA/PG_VERSION" ] || return 0
  if as_owner "$PGBIN/pg_ctl" -D "$DATA" status >/dev/null 2>&1; then
    as_owner "$PGBIN/pg_ctl" -D "$DATA" -m fast -w stop >/dev/null
    log "stopped"
  fi
}

createdb() {
  local name="$1"
  ensure_binaries
  if [ "$(psql_admin -tAc "select 1 from pg_database where datname = '$name'")" != "1" ]; then
    psql_admin -c "create database \"$name\""
    log "created database $name"
  fi
}

dropdb() { ensure_binaries; psql_admin -c "drop database if exists \"$1\" with (force)"; }

if [ -n "${DATABASE_URL:-}" ]; then log "DATABASE_URL is set; using that server"; exit 0; fi

case "${1:-}" in
  start) start; createdb "${BRANCHLINE_DB_NAME:-branchline}" ;;
  stop) stop ;;
  status) ensure_binaries; is_running && echo running || echo stopped ;;
  createdb) createdb "$2" ;;
  dropdb) dropdb "$2" ;;
  *) echo "usage: scripts/pg.sh start|stop|status|createdb NAME|dropdb NAME" >&2; exit 2 ;;
esac

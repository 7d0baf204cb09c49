#!/usr/bin/env bash
# The project's own PostgreSQL: a cluster in .data/pg on 127.0.0.1, used by `npm start` and `npm test`.
# Usage: scripts/pg.sh ensure | stop | status | url [db] | createdb NAME | recreatedb NAME | bindir
# Progress goes to stderr; only `url`, `bindir` (the PostgreSQL binaries' directory) and `status` print to stdout.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA="$ROOT/.data/pg"
SOCKDIR="$ROOT/.data/pg-run"
PORT="${SLACKWATER_PG_PORT:-54329}"
HOST=127.0.0.1

say() { printf 'pg: %s\n' "$*" >&2; }
die() { printf 'pg: error: %s\n' "$*" >&2; exit 1; }
is_root() { [ "$(id -u)" = 0 ]; }

# Newest installed major version wins (sort -V orders 9.6 < 15 < 16).
find_bindir() {
  local ctl
  ctl="$(ls /usr/lib/postgresql/*/bin/pg_ctl 2>/dev/null | sort -V | tail -n 1 || true)"
  [ -n "$ctl" ] && dirname "$ctl"
}

install_binaries() {
  if ! is_root; then
    die "PostgreSQL server binaries not found (/usr/lib/postgresql/*/bin/pg_ctl).
Install them first, e.g.:  sudo apt-get install -y postgresql
(or set DATABASE_URL to a server you already run)."
  fi
  say "installing the Debian postgresql package (apt-get)"
  DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
}

BINDIR=""
bindir() {
  if [ -z "$BINDIR" ]; then
    BINDIR="$(find_bindir || true)"
    if [ -z "$BINDIR" ]; then install_binaries; BINDIR="$(find_bindir || true)"; fi
    [ -n "$BINDIR" ] || die "PostgreSQL binaries still missing after install"
  fi
  printf '%s' "$BINDIR"
}

# initdb and postgres refuse to run as root: as root they run as the `postgres` system user.
as_pg() {
  if is_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

# WARNING: the postgres user must be able to traverse every parent of .data (a clone under a
# private home directory would otherwise fail with "permission denied"). Adds o+x (search only).
open_parents() {
  is_root || return 0
  local dir="" part
  local -a parts
  IFS=/ read -r -a parts <<< "${ROOT#/}"
  # Top-down, so only the directory that actually blocks the way is changed.
  for part in "${parts[@]}"; do
    dir="$dir/$part"
    if ! runuser -u postgres -- test -x "$dir"; then
      say "granting search permission (o+x) on $dir so the postgres user can reach .data"
      chmod o+x "$dir"
    fi
  done
}

prepare_dirs() {
  mkdir -p "$ROOT/.data" "$DATA" "$SOCKDIR"
  if is_root; then
    chmod 755 "$ROOT/.data"
    chown postgres:postgres "$DATA" "$SOCKDIR"
    open_parents
  fi
  chmod 700 "$DATA"
}

init_cluster() {
  [ -f "$DATA/PG_VERSION" ] && return 0
  say "creating cluster in .data/pg"
  as_pg "$(bindir)/initdb" -D "$DATA" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
}

running() {
  [ -f "$DATA/PG_VERSION" ] || return 1
  as_pg "$(bindir)/pg_ctl" -D "$DATA" status >/dev/null 2>&1
}

start_server() {
  say "starting PostgreSQL on $HOST:$PORT"
  if ! as_pg "$(bindir)/pg_ctl" -D "$DATA" -l "$DATA/server.log" \
    -o "-c listen_addresses=$HOST -p $PORT -k $SOCKDIR" -w -t 60 start >/dev/null; then
    tail -n 15 "$DATA/server.log" >&2 || true
    die "PostgreSQL did not start (port $PORT busy? set SLACKWATER_PG_PORT)"
  fi
}

psql_admin() {
  PGOPTIONS="-c client_min_messages=warning" "$(bindir)/psql" -X -q -v ON_ERROR_STOP=1 -h "$HOST" -p "$PORT" -U postgres -d postgres "$@"
}

wait_ready() {
  local i
  for i in $(seq 1 60); do
    "$(bindir)/pg_isready" -q -h "$HOST" -p "$PORT" -U postgres && return 0
    sleep 0.5
  done
  die "PostgreSQL on $HOST:$PORT is not accepting connections"
}

cmd_ensure() {
  bindir >/dev/null
  prepare_dirs
  init_cluster
  if running; then say "already running on $HOST:$PORT"; else start_server; fi
  wait_ready
}

cmd_stop() {
  if running; then
    say "stopping PostgreSQL"
    as_pg "$(bindir)/pg_ctl" -D "$DATA" -m fast -w stop >/dev/null
  else
    say "not running"
  fi
}

cmd_status() {
  if [ ! -f "$DATA/PG_VERSION" ]; then echo "no cluster in .data/pg"; exit 3; fi
  if running; then echo "running on $HOST:$PORT"; else echo "stopped"; exit 3; fi
}

check_name() {
  [[ "${1:-}" =~ ^[a-z_][a-z0-9_]*$ ]] || die "database name must match [a-z_][a-z0-9_]*: '${1:-}'"
}

db_exists() {
  [ "$(psql_admin -At -c "select 1 from pg_database where datname = '$1'")" = 1 ]
}

cmd_createdb() {
  check_name "${1:-}"
  cmd_ensure
  if db_exists "$1"; then return 0; fi
  say "creating database $1"
  psql_admin -c "create database \"$1\""
}

cmd_recreatedb() {
  check_name "${1:-}"
  cmd_ensure
  say "recreating database $1"
  psql_admin -c "drop database if exists \"$1\" with (force)" -c "create database \"$1\""
}

case "${1:-}" in
  ensure) cmd_ensure ;;
  stop) cmd_stop ;;
  status) cmd_status ;;
  url) db="${2:-slackwater}"; check_name "$db"; echo "postgres://postgres@$HOST:$PORT/$db" ;;
  createdb) cmd_createdb "${2:-}" ;;
  recreatedb) cmd_recreatedb "${2:-}" ;;
  bindir) bindir; echo ;;
  *) echo "usage: scripts/pg.sh ensure|stop|status|url [db]|createdb NAME|recreatedb NAME|bindir" >&2; exit 2 ;;
esac

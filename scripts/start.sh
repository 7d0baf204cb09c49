#!/usr/bin/env bash
# `npm start`: project-local PostgreSQL (unless DATABASE_URL is set), migrations + demo seed,
# web export when stale, then the API server in the foreground. Ctrl-C / SIGTERM stops the server,
# then the PostgreSQL this script started (never one it found running or one named by DATABASE_URL).
set -euo pipefail
cd "$(dirname "$0")/.."

say() { printf 'start: %s\n' "$*" >&2; }

started_pg=0
server_pid=""
issuer_pid=""

cleanup() {
  local status=$?
  # WARNING: ignore further signals from here on (a second Ctrl-C, the terminal's SIGINT reaching this shell
  # as well as the server): PostgreSQL must be stopped after the server has exited, never skipped or before.
  # The server bounds its own stop (SHUTDOWN_GRACE_SECONDS, then a few seconds to close), so this wait ends.
  trap - EXIT
  trap '' INT TERM
  if [ -n "$server_pid" ] && kill -0 "$server_pid" 2>/dev/null; then
    say "stopping the server"
    kill -TERM "$server_pid" 2>/dev/null || true
    wait "$server_pid" 2>/dev/null || true
  fi
  if [ -n "$issuer_pid" ] && kill -0 "$issuer_pid" 2>/dev/null; then
    say "stopping the local sign-on issuer"
    kill -TERM "$issuer_pid" 2>/dev/null || true
    wait "$issuer_pid" 2>/dev/null || true
  fi
  if [ "$started_pg" = 1 ]; then bash scripts/pg.sh stop || true; fi
  exit "$status"
}
trap cleanup EXIT
# WARNING: exiting from the signal traps runs cleanup via EXIT; the server is not exec'd so that
# this shell survives to stop PostgreSQL after it.
trap 'exit 130' INT
trap 'exit 143' TERM

. scripts/lib/local-db.sh
use_local_database

# The local tsx binary is what `npx tsx` would run; calling it directly saves a process layer
# between this shell and the server, so signals reach the server at once.
TSX=node_modules/.bin/tsx
[ -x "$TSX" ] || TSX="npx tsx"

$TSX db/setup.ts
if [ -f scripts/export-web.sh ]; then bash scripts/export-web.sh; fi

# The demo's single sign-on issuer (docs/sso.md), on loopback; OIDC_ISSUER_PORT=off skips it.
if [ "${OIDC_ISSUER_PORT:-8181}" != off ]; then
  OIDC_ISSUER_PORT="${OIDC_ISSUER_PORT:-8181}" $TSX scripts/oidc-issuer.ts &
  issuer_pid=$!
  say "local sign-on issuer on http://127.0.0.1:${OIDC_ISSUER_PORT:-8181}"
fi

say "API on http://127.0.0.1:${PORT:-8080}"
# A background job plus `wait` lets the traps run as soon as a signal arrives.
$TSX server/index.ts &
server_pid=$!
wait "$server_pid"

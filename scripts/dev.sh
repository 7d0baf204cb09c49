#!/usr/bin/env bash
# `npm run dev`: the database as `npm start` prepares it, the API under `tsx watch` (restarts on change) and
# Metro's web dev server (fast refresh), which passes /api/* to the API (see metro.config.js).
# Ctrl-C / SIGTERM stops both, then the PostgreSQL this script started (never one it found running).
set -euo pipefail
cd "$(dirname "$0")/.."

say() { printf 'dev: %s\n' "$*" >&2; }

API_PORT="${PORT:-8080}"
METRO_PORT="${METRO_PORT:-8081}"
started_pg=0
pids=()

cleanup() {
  local status=$?
  trap - EXIT INT TERM
  local pid
  # Each child leads its own process group (setsid), so this also stops tsx's and Metro's own children.
  for pid in "${pids[@]}"; do kill -TERM -- "-$pid" 2>/dev/null || true; done
  for pid in "${pids[@]}"; do wait "$pid" 2>/dev/null || true; done
  if [ "$started_pg" = 1 ]; then bash scripts/pg.sh stop || true; fi
  exit "$status"
}
trap cleanup EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

. scripts/lib/local-db.sh
use_local_database

BIN=node_modules/.bin
"$BIN/tsx" db/setup.ts

say "API on http://127.0.0.1:$API_PORT (restarts on change)"
PORT="$API_PORT" NODE_ENV=development setsid "$BIN/tsx" watch --clear-screen=false server/index.ts &
pids+=($!)

say "web app on http://localhost:$METRO_PORT (Metro, fast refresh; /api goes to port $API_PORT)"
# WARNING: EXPO_NO_TYPESCRIPT_SETUP keeps `expo start` from rewriting tsconfig.json and deleting expo-env.d.ts.
EXPO_NO_TYPESCRIPT_SETUP=1 SLACKWATER_API_PORT="$API_PORT" setsid "$BIN/expo" start --web --port "$METRO_PORT" &
pids+=($!)

# Stop everything as soon as either side exits, so a crashed half never runs on alone.
wait -n "${pids[@]}"

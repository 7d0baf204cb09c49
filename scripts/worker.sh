#!/usr/bin/env bash
# `npm run worker`: a stand-alone job worker (plan runs, mail) on the same database as `npm start` — the
# project-local PostgreSQL unless DATABASE_URL names another server. Start more, here or on other machines
# (with DATABASE_URL), and they share the queue. The worker leaves PostgreSQL running when it exits: an API
# process or other workers may be using it.
set -euo pipefail
cd "$(dirname "$0")/.."

say() { printf 'worker: %s\n' "$*" >&2; }

. scripts/lib/local-db.sh
use_local_database

TSX=node_modules/.bin/tsx
[ -x "$TSX" ] || TSX="npx tsx"
# exec: signals (Ctrl-C, SIGTERM) reach the worker itself, which hands a run in progress back to the queue.
exec $TSX server/worker.ts

#!/usr/bin/env bash
# `npm test`: type check, lint, unit/property/API/component tests, then the end-to-end suite in Chromium.
# Uses the project's own PostgreSQL (scripts/pg.sh) unless DATABASE_URL points elsewhere; leaves nothing running.
set -euo pipefail
cd "$(dirname "$0")/.."

step() { printf '\n== %s\n' "$*" >&2; }

step "type check (tsc --noEmit, strict)"
npx tsc --noEmit -p tsconfig.json

step "lint (ESLint with the folder import rules)"
npx eslint --max-warnings 0 .

started_pg=0
server_pid=""
cleanup() {
  if [ -n "$server_pid" ]; then kill "$server_pid" 2>/dev/null || true; wait "$server_pid" 2>/dev/null || true; fi
  if [ "$started_pg" = 1 ]; then bash scripts/pg.sh stop || true; fi
}
trap cleanup EXIT INT TERM

if [ -z "${DATABASE_URL:-}" ]; then
  step "PostgreSQL (project-local cluster)"
  if ! bash scripts/pg.sh status >/dev/null 2>&1; then started_pg=1; fi
  bash scripts/pg.sh ensure
  bash scripts/pg.sh recreatedb slackwater_test
  bash scripts/pg.sh recreatedb slackwater_e2e
  bash scripts/pg.sh recreatedb slackwater_e2e_fresh
  TEST_DATABASE_URL="$(bash scripts/pg.sh url slackwater_test)"
  E2E_DATABASE_URL="$(bash scripts/pg.sh url slackwater_e2e)"
  E2E_FRESH_DATABASE_URL="$(bash scripts/pg.sh url slackwater_e2e_fresh)"
else
  # An external server: the tests create their databases next to the one named in DATABASE_URL.
  base="${DATABASE_URL%/*}"
  for name in slackwater_test slackwater_e2e slackwater_e2e_fresh; do
    psql "$DATABASE_URL" -v ON_ERROR_STOP=1 -qc "drop database if exists $name" -c "create database $name"
  done
  TEST_DATABASE_URL="$base/slackwater_test"
  E2E_DATABASE_URL="$base/slackwater_e2e"
  E2E_FRESH_DATABASE_URL="$base/slackwater_e2e_fresh"
fi
# The first-day suite starts its own server without the demo on this empty database.
export E2E_FRESH_DATABASE_URL
export TEST_DATABASE_URL

step "unit, property, API and component tests (jest)"
npx jest --ci

step "end-to-end (Chromium)"
bash scripts/ensure-chromium.sh
bash scripts/export-web.sh
DATABASE_URL="$E2E_DATABASE_URL" npx tsx db/setup.ts
# A free port picked by the OS, so a server left over elsewhere can never answer for ours.
E2E_PORT="${E2E_PORT:-$(node -e "const s=require('net').createServer().listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")}"
# The server works plan runs and mail itself (WORKER_IN_PROCESS); its SMTP sink takes any free port so
# parallel runs never clash. The local tsx binary passes the clean-up's signal on to the server; `npx` would not,
# and left the server running after the suite.
DATABASE_URL="$E2E_DATABASE_URL" PORT="$E2E_PORT" HOST=127.0.0.1 WORKER_IN_PROCESS=true SMTP_SINK_PORT=0 \
  node_modules/.bin/tsx server/index.ts > .data/e2e-server.log 2>&1 &
server_pid=$!
for _ in $(seq 1 60); do
  curl -fs "http://127.0.0.1:$E2E_PORT/api/ready" >/dev/null 2>&1 && break
  kill -0 "$server_pid" 2>/dev/null || { cat .data/e2e-server.log >&2; exit 1; }
  sleep 0.5
done
# --forceExit: a failed test must not leave jest waiting on a browser it could not close.
# --runInBand: the suites share one demo database and its policies (sign-off quorum, code requirement).
E2E_BASE_URL="http://127.0.0.1:$E2E_PORT" npx jest --ci --forceExit --runInBand -c jest.e2e.config.js

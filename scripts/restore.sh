#!/usr/bin/env bash
# `npm run restore -- FILE`: loads a `npm run backup` archive into an EMPTY database — the one DATABASE_URL names,
# else the project-local cluster's `slackwater` database (created when missing). It refuses a database that holds
# any table, view, sequence or schema of its own: a restore never mixes with, or overwrites, live data.
# All or nothing: one transaction, stopped at the first error.
set -euo pipefail
cd "$(dirname "$0")/.."

say() { printf 'restore: %s\n' "$*" >&2; }
die() { printf 'restore: error: %s\n' "$*" >&2; exit 1; }

file="${1:-}"
[ -n "$file" ] || die "usage: npm run restore -- FILE (a file written by npm run backup)"
[ -f "$file" ] || die "no file $file"

BIN="$(bash scripts/pg.sh bindir)"
"$BIN/pg_restore" --list "$file" >/dev/null 2>&1 || die "$file is not a pg_dump archive in the custom format (npm run backup writes one)"

if [ -n "${DATABASE_URL:-}" ]; then
  url="$DATABASE_URL"
  target="the database DATABASE_URL names"
else
  bash scripts/pg.sh ensure
  bash scripts/pg.sh createdb slackwater
  url="$(bash scripts/pg.sh url slackwater)"
  target="the project-local database slackwater"
fi

# Relations (tables, views, sequences, indexes) outside the system schemas, plus schemas besides `public`.
objects="$("$BIN/psql" -X -At -v ON_ERROR_STOP=1 --dbname="$url" -c "
  select (select count(*) from pg_class c join pg_namespace n on n.oid = c.relnamespace
          where n.nspname <> 'information_schema' and n.nspname !~ '^pg_')
       + (select count(*) from pg_namespace
          where nspname not in ('public', 'information_schema') and nspname !~ '^pg_')")" \
  || die "cannot read $target (is it running, and does the database exist?)"
if [ "$objects" != 0 ]; then
  die "$target is not empty ($objects tables, views, sequences, indexes or schemas): restore only goes into an empty
database. Restore into a new one and point DATABASE_URL at it, e.g. on the project-local cluster:
  bash scripts/pg.sh createdb slackwater_restored
  DATABASE_URL=\$(bash scripts/pg.sh url slackwater_restored) npm run restore -- $file"
fi

say "restoring $file into $target"
# --no-owner/--no-privileges: the objects belong to the role restoring them, whatever role owned them before.
"$BIN/pg_restore" --no-owner --no-privileges --exit-on-error --single-transaction --dbname="$url" "$file"
# pg_restore loads no planner statistics; gather them so the first queries are planned well.
"$BIN/vacuumdb" --analyze-only --quiet --dbname="$url"
say "restored; npm start applies any migrations newer than the backup"

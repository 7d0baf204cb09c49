#!/usr/bin/env bash
# `npm run backup [-- FILE]`: a pg_dump archive in the custom format (-Fc) of the project's database — the one
# DATABASE_URL names, else the project-local cluster's `slackwater` database (scripts/pg.sh). Default FILE:
# .data/backups/slackwater-<UTC time>.dump. The archive holds everything, password hashes included: keep it as
# private as the database. Restore with `npm run restore -- FILE` (docs/operations.md, "Backups").
set -euo pipefail
cd "$(dirname "$0")/.."

say() { printf 'backup: %s\n' "$*" >&2; }
die() { printf 'backup: error: %s\n' "$*" >&2; exit 1; }

BIN="$(bash scripts/pg.sh bindir)"

if [ -n "${DATABASE_URL:-}" ]; then
  url="$DATABASE_URL"
  say "dumping the database DATABASE_URL names"
else
  bash scripts/pg.sh status >/dev/null 2>&1 \
    || die "the project-local PostgreSQL is not running (start it: bash scripts/pg.sh ensure), or set DATABASE_URL"
  url="$(bash scripts/pg.sh url slackwater)"
  say "dumping the project-local database slackwater"
fi

file="${1:-.data/backups/slackwater-$(date -u +%Y%m%dT%H%M%SZ).dump}"
[ -e "$file" ] && die "$file exists; name a new file"
mkdir -p "$(dirname "$file")"
umask 077
# Written under a temporary name and renamed once complete: a file with the final name is always a whole dump.
partial="$file.partial"
trap 'rm -f "$partial"' EXIT
"$BIN/pg_dump" --format=custom --file="$partial" --dbname="$url"
"$BIN/pg_restore" --list "$partial" >/dev/null || die "pg_dump wrote an archive pg_restore cannot read"
mv "$partial" "$file"
trap - EXIT
say "wrote $file ($(du -k "$file" | cut -f1) KiB)"
printf '%s\n' "$file"

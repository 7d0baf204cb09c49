#!/usr/bin/env bash
# Exports the web app to dist/ when dist/index.html is missing or older than any source it is built from.
# Then adds preload tags to index.html (scripts/preload-web.ts) and writes brotli and gzip copies of its compressible
# files (scripts/precompress-web.ts; kept copies are reused), in that order so index.html's copies carry the tags.
# Prints one line either way, plus one for each of the two steps; on failure, the tail of the export log as well.
set -euo pipefail
cd "$(dirname "$0")/.."

OUT=dist
LOG=.expo/export-web.log
SOURCES=(app components hooks constants shared assets metro app.json package.json babel.config.js metro.config.js)

needs_export() {
  [ -f "$OUT/index.html" ] || return 0
  local source present=()
  for source in "${SOURCES[@]}"; do [ -e "$source" ] && present+=("$source"); done
  [ -n "$(find "${present[@]}" -type f -newer "$OUT/index.html" -print -quit)" ]
}

precompress() { npx tsx scripts/preload-web.ts "$OUT" && npx tsx scripts/precompress-web.ts "$OUT"; }

if ! needs_export; then
  echo "export-web: $OUT/ is up to date"
  precompress
  exit 0
fi

mkdir -p "$(dirname "$LOG")"
started_s=$SECONDS
# CI=1: no prompts, no watch mode, no network look-ups (the export works offline).
if ! CI=1 npx expo export --platform web --output-dir "$OUT" >"$LOG" 2>&1; then
  tail -n 30 "$LOG" >&2
  echo "export-web: export FAILED after $((SECONDS - started_s)) s (full log: $LOG)" >&2
  exit 1
fi
echo "export-web: exported the web app to $OUT/ in $((SECONDS - started_s)) s"
precompress

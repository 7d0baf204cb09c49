# Sourced by start.sh and dev.sh: the project-local PostgreSQL and its `slackwater` database, unless
# DATABASE_URL names another server. Sets started_pg=1 when this call started the cluster (the caller
# stops it on exit) and exports DATABASE_URL.
use_local_database() {
  started_pg=0
  if [ -n "${DATABASE_URL:-}" ]; then
    say "using DATABASE_URL (no local PostgreSQL started)"
    return
  fi
  if ! bash scripts/pg.sh status >/dev/null 2>&1; then started_pg=1; fi
  bash scripts/pg.sh ensure
  bash scripts/pg.sh createdb slackwater
  DATABASE_URL="$(bash scripts/pg.sh url slackwater)"
  export DATABASE_URL
}

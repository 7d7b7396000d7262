#!/usr/bin/env bash
# restore.sh FILE [DBNAME]: replaces the database with a backup made by backup.sh. Stop the app first
# (npm stop, then start only PostgreSQL) so nothing writes while the old data is dropped.
source "$(dirname "$0")/lib.sh"
[ $# -ge 1 ] || die "usage: docker-free-scripts/restore.sh FILE [DBNAME]"
file="$1"
name="${2:-$GELPOINT_DB_NAME}"
[ -s "$file" ] || die "no backup at $file"
pg_running || die "PostgreSQL is not running: start it first."
ensure_database "$name" --fresh
PGPASSWORD="$(cat "$GP_PG_SUPERPW_FILE")" "$(pg_bin_dir)/pg_restore" -h 127.0.0.1 -p "$GELPOINT_PG_PORT" -U postgres \
  --dbname="$name" --no-owner --role="$GELPOINT_DB_USER" --exit-on-error "$file"
say "restored $name from $file"

#!/usr/bin/env bash
# backup.sh [DBNAME] [FILE]: a consistent snapshot of the database (pg_dump custom format) while the app runs.
source "$(dirname "$0")/lib.sh"
name="${1:-$GELPOINT_DB_NAME}"
file="${2:-$GELPOINT_DATA_DIR/backups/$name-$(date -u +%Y%m%dT%H%M%SZ).dump}"
mkdir -p "$(dirname "$file")"
pg_running || die "PostgreSQL is not running: start it with npm start (or npm test) first."
PGPASSWORD="$(cat "$GP_PG_SUPERPW_FILE")" "$(pg_bin_dir)/pg_dump" -h 127.0.0.1 -p "$GELPOINT_PG_PORT" -U postgres \
  --format=custom --no-owner --no-privileges --file="$file" "$name"
say "backed up $name to $file ($(du -h "$file" | cut -f1))"

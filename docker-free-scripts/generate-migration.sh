#!/usr/bin/env bash
# npm run db:generate -- Name: diff the entities against a scratch database migrated to head.
source "$(dirname "$0")/lib.sh"
[ $# -eq 1 ] || die "usage: npm run db:generate -- CamelCaseName"
pg_start
ensure_database gelpoint_codegen --fresh
DATABASE_URL="$(db_url gelpoint_codegen)" npx tsx packages/db/src/cli/generate-migration.ts "$1"

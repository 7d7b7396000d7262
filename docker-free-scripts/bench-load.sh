#!/usr/bin/env bash
# npm run bench:load: a fresh gelpoint_bench database (migrated, demo shop seeded), then two API
# instances, two workers and the mail sink against it, loaded with autocannon on loopback.
# Prints a table of req/s, p50, p99 and errors per endpoint and the cross-instance checks; exits
# non-zero when a request failed or a check did not hold. Takes under two minutes.
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps
pg_start
ensure_database gelpoint_bench --fresh
export DATABASE_URL="$(db_url gelpoint_bench)"
GELPOINT_LOG_LEVEL=warn npx tsx packages/db/src/cli/migrate.ts >/dev/null
npx tsx packages/db/src/cli/seed.ts >/dev/null
status=0
node --import tsx apps/api/bench/run.ts || status=$?
PGOPTIONS="-c client_min_messages=warning" superuser_psql -c 'DROP DATABASE IF EXISTS gelpoint_bench WITH (FORCE)'
exit $status

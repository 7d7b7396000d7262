#!/usr/bin/env bash
# npm run bench:upload: the 1M-triangle bench mould (about 50 MB of binary STL) uploaded to the built API with the
# built worker running, timed from the first byte sent to the `ready` event of the mould's event stream, against
# the whole `gelpoint mold` process on the same file in the same run. Prints the fastest and median of
# GELPOINT_BENCH_RUNS runs (default 3) and the fastest run's progress events.
#
# It runs on a PostgreSQL cluster of its own (GELPOINT_BENCH_PG_PORT, default 54341, stopped at the end) and a fresh
# database, so the figures do not depend on what the everyday database holds.
bench_port="${GELPOINT_BENCH_PG_PORT:-54341}"
if [ "$bench_port" = 54329 ]; then
  printf 'gelpoint: GELPOINT_BENCH_PG_PORT is the port of the everyday database; the bench stops its PostgreSQL, so pick another port.\n' >&2
  exit 1
fi
export GELPOINT_PG_PORT="$bench_port"
unset GELPOINT_PG_ROOT DATABASE_URL
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps

trap pg_stop EXIT
pg_start
ensure_database gelpoint_upload_bench --fresh
export DATABASE_URL="$(db_url gelpoint_upload_bench)"
GELPOINT_LOG_LEVEL=silent npx tsx docker-free-scripts/faults/prepare-database.ts
# The API, worker and CLI run as npm start and a person's shell run them: built.
node docker-free-scripts/build.mjs api worker cli >/dev/null

status=0
npx tsx docker-free-scripts/bench-upload/run.ts || status=$?
PGOPTIONS="-c client_min_messages=warning" superuser_psql -c 'DROP DATABASE IF EXISTS gelpoint_upload_bench WITH (FORCE)'
exit $status

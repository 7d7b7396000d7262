#!/usr/bin/env bash
# npm run check:faults: the real API, worker and mail sink against a PostgreSQL of their own, through a
# database restart, a killed worker, two workers, a mail sink outage and failed uploads. One line per
# check ("ok - …" / "not ok - …"), a totals line, and a non-zero exit on any failure.
# Arguments pick checks by name (e.g. `npm run check:faults -- worker-killed`).
#
# The checks stop and start PostgreSQL, so they get a cluster of their own on GELPOINT_FAULTS_PG_PORT
# (default 54339, data under pg-<port> beside the usual cluster): the developer's database is never
# touched, whatever GELPOINT_PG_PORT says.
faults_port="${GELPOINT_FAULTS_PG_PORT:-54339}"
if [ "$faults_port" = "${GELPOINT_PG_PORT:-54329}" ] || [ "$faults_port" = 54329 ]; then
  printf 'gelpoint: GELPOINT_FAULTS_PG_PORT (%s) is the port of the everyday database; the checks stop their PostgreSQL, so pick another port.\n' "$faults_port" >&2
  exit 1
fi
export GELPOINT_PG_PORT="$faults_port"
unset GELPOINT_PG_ROOT DATABASE_URL
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps

trap pg_stop EXIT
pg_start
ensure_database gelpoint_faults --fresh
export DATABASE_URL="$(db_url gelpoint_faults)"
export GELPOINT_FAULTS_PG_PORT="$faults_port"
export GELPOINT_LOG_LEVEL=silent
npx tsx docker-free-scripts/faults/prepare-database.ts
# The checks run the product's processes as npm start does: built.
node docker-free-scripts/build.mjs api worker mailsink

status=0
npx tsx docker-free-scripts/faults/run.ts "$@" || status=$?
exit $status

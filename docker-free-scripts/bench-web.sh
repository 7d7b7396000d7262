#!/usr/bin/env bash
# npm run bench:web: the web app's performance budgets, measured in Chromium against a big shop.
# Builds the web app, makes a fresh gelpoint_webbench database (migrated, demo seed, then 500 open
# pours and 1,000 lots for the demo shop, written by apps/api/bench/seed-big-shop.ts beside the API's
# own bench set-up), runs apps/web/bench/run.ts (the stack on free ports) and
# drops the database again. Exits non-zero when a budget is broken.
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps
ensure_apt_package chromium test -x /usr/bin/chromium
say "building what changed…"
node docker-free-scripts/build.mjs
pg_start
db=gelpoint_webbench
ensure_database "$db" --fresh
trap 'PGOPTIONS="-c client_min_messages=warning" superuser_psql -c "DROP DATABASE IF EXISTS \"$db\" WITH (FORCE)" || true' EXIT
export DATABASE_URL="$(db_url "$db")"
npx tsx packages/db/src/cli/migrate.ts >/dev/null
npx tsx packages/db/src/cli/seed.ts >/dev/null
say "adding a big shop's pours and lots…"
node --import tsx apps/api/bench/seed-big-shop.ts 500 1000
say "measuring in Chromium (${GELPOINT_WEBBENCH_RUNS:-5} runs of each measure)…"
# The bench starts the same processes as the browser tests (apps/web/e2e/support/stack.ts), pointed at this database.
GELPOINT_E2E_DATABASE_URL="$DATABASE_URL" GELPOINT_LOG_LEVEL=warn node --import tsx apps/web/bench/run.ts

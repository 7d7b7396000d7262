#!/usr/bin/env bash
# npm test: the same set-up as npm start against separate test databases, then every test.
# Ends with one totals line, "N passed, N failed", and a non-zero exit on any failure.
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps
ensure_apt_package chromium test -x /usr/bin/chromium
pg_start
ensure_database gelpoint_test --fresh
ensure_database gelpoint_e2e --fresh
export GELPOINT_TEST_DATABASE_URL="$(db_url gelpoint_test)"
export GELPOINT_E2E_DATABASE_URL="$(db_url gelpoint_e2e)"
# Tests never touch the development database, and get a throwaway signing secret.
export DATABASE_URL="$GELPOINT_TEST_DATABASE_URL"
export GELPOINT_JWT_SECRET="$(node -e 'process.stdout.write(require("crypto").randomBytes(48).toString("base64url"))')"
export GELPOINT_LOG_LEVEL="${GELPOINT_LOG_LEVEL:-silent}"
npx tsx packages/db/src/cli/migrate.ts
DATABASE_URL="$GELPOINT_E2E_DATABASE_URL" npx tsx packages/db/src/cli/migrate.ts
DATABASE_URL="$GELPOINT_E2E_DATABASE_URL" npx tsx packages/db/src/cli/seed.ts

status=0
say "type-checking every workspace (tsc -b, incremental)…"
if npx tsc -b tsconfig.json; then typecheck=1; else typecheck=0; status=1; fi
say "building what changed (the browser tests use the web build, the CLI tests the built command)…"
if node docker-free-scripts/build.mjs; then built=1; else built=0; status=1; fi
say "looking for import cycles…"
if node docker-free-scripts/check-cycles.mjs; then acyclic=1; else acyclic=0; status=1; fi

mkdir -p "$GELPOINT_DATA_DIR"
results="$GELPOINT_DATA_DIR/test-results.json"
rm -f "$results"
npx vitest run --reporter=default --reporter=json --outputFile.json="$results" "$@" || status=1
node docker-free-scripts/test-totals.mjs "$results" "$typecheck" "$built" "$acyclic" || status=1
exit $status

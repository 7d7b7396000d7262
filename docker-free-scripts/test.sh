#!/usr/bin/env bash
# npm test: the type-check, the build and the import-cycle check, then every test. Ends with one totals line,
# "N passed, N failed", and a non-zero exit on any failure.
# npm test -- <file or vitest arguments>: only vitest, whose projects prepare just what the chosen files need
# (docker-free-scripts/test-setup: PostgreSQL and the test databases for the database project, the demo, the web
# build and the shared stack for the browser project, the CLI build for the CLI's tests).
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps
ensure_apt_package chromium test -x /usr/bin/chromium
# Tests never touch the development database (the set-up points DATABASE_URL at the test database), and get a
# throwaway signing secret.
export DATABASE_URL="$(db_url gelpoint_test_1)"
export GELPOINT_JWT_SECRET="$(node -e 'process.stdout.write(require("crypto").randomBytes(48).toString("base64url"))')"
export GELPOINT_LOG_LEVEL="${GELPOINT_LOG_LEVEL:-silent}"

status=0
typecheck=1 built=1 acyclic=1 linted=1
if [ $# -eq 0 ]; then
  say "type-checking every workspace (tsc -b, incremental)…"
  npx tsc -b tsconfig.json || { typecheck=0; status=1; }
  say "building what changed (the browser tests use the web build, the CLI tests the built command)…"
  node docker-free-scripts/build.mjs || { built=0; status=1; }
  say "looking for import cycles…"
  node docker-free-scripts/check-cycles.mjs || { acyclic=0; status=1; }
  say "linting (ESLint: the layout's boundaries, the rules of hooks) and checking the format (Prettier)…"
  npx eslint . --cache --cache-location "$GELPOINT_DATA_DIR/eslintcache" --max-warnings 0 || { linted=0; status=1; }
  npx prettier --check --cache --log-level warn . || { linted=0; status=1; }
fi

mkdir -p "$GELPOINT_DATA_DIR"
results="$GELPOINT_DATA_DIR/test-results.json"
rm -f "$results"
npx vitest run --reporter=default --reporter=json --outputFile.json="$results" "$@" || status=1
if [ $# -eq 0 ]; then
  node docker-free-scripts/test-totals.mjs "$results" "$typecheck" "$built" "$acyclic" "$linted" || status=1
else
  node docker-free-scripts/test-totals.mjs "$results" --tests-only || status=1
fi
exit $status

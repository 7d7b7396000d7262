#!/usr/bin/env bash
# npm run dev: the stack as in npm start, plus Vite's dev server with hot reload for the web app.
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps
pg_start
ensure_database "$GELPOINT_DB_NAME"
ensure_jwt_secret
export DATABASE_URL="${DATABASE_URL:-$(db_url "$GELPOINT_DB_NAME")}"
npx tsx packages/db/src/cli/migrate.ts
npx tsx packages/db/src/cli/seed.ts
export GELPOINT_PUBLIC_URL="${GELPOINT_PUBLIC_URL:-http://127.0.0.1:5173}"
npm run dev -w @gelpoint/web -- --host 127.0.0.1 --port 5173 --strictPort &
vite_pid=$!
trap 'kill $vite_pid 2>/dev/null' EXIT
node --import tsx docker-free-scripts/stack.ts

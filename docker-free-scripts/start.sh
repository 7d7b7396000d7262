#!/usr/bin/env bash
# npm start: set up whatever is missing, then run the whole stack in the foreground.
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps
require_free_port "$GELPOINT_API_PORT" "the app and API" GELPOINT_API_PORT
require_free_port "$MAILSINK_SMTP_PORT" "the mail sink's SMTP" MAILSINK_SMTP_PORT
require_free_port "$MAILSINK_HTTP_PORT" "the mail sink's page" MAILSINK_HTTP_PORT
say "building the web app…"
npm run build --silent -w @gelpoint/web >/dev/null
pg_start
ensure_database "$GELPOINT_DB_NAME"
ensure_jwt_secret
export DATABASE_URL="${DATABASE_URL:-$(db_url "$GELPOINT_DB_NAME")}"
npx tsx packages/db/src/cli/migrate.ts
npx tsx packages/db/src/cli/seed.ts
exec node --import tsx docker-free-scripts/stack.ts

#!/usr/bin/env bash
# npm start: set up whatever is missing, then run the whole stack in the foreground.
source "$(dirname "$0")/lib.sh"
cd "$GP_ROOT"
ensure_node_deps
require_free_port "$GELPOINT_API_PORT" "the app and API" GELPOINT_API_PORT
require_free_port "$MAILSINK_SMTP_PORT" "the mail sink's SMTP" MAILSINK_SMTP_PORT
require_free_port "$MAILSINK_HTTP_PORT" "the mail sink's page" MAILSINK_HTTP_PORT
say "building what changed since the last build…"
node docker-free-scripts/build.mjs
pg_start
ensure_database "$GELPOINT_DB_NAME"
ensure_jwt_secret
export DATABASE_URL="${DATABASE_URL:-$(db_url "$GELPOINT_DB_NAME")}"
# From here on only built JavaScript runs: no TypeScript loader in any process.
export NODE_ENV=production
node packages/db/dist/cli/migrate.js
node packages/db/dist/cli/seed.js
exec node docker-free-scripts/dist/stack.js

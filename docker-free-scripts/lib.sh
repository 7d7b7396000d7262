# Shared settings and helpers for the docker-free scripts. Source it; do not run it.
# Every setting can be overridden from the environment.
set -euo pipefail

GP_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
# tsx (npm run dev, the tests) applies only the tsconfig it is pointed at, and only to the files that
# tsconfig includes; the root tsconfig.json is a solution that includes none, so point tsx at the
# options every workspace shares (TypeORM's entities need experimentalDecorators).
export TSX_TSCONFIG_PATH="${TSX_TSCONFIG_PATH:-$GP_ROOT/tsconfig.base.json}"
export GELPOINT_DATA_DIR="${GELPOINT_DATA_DIR:-$GP_ROOT/.data}"
export GELPOINT_PG_PORT="${GELPOINT_PG_PORT:-54329}"
export GELPOINT_DB_USER="${GELPOINT_DB_USER:-gelpoint}"
export GELPOINT_DB_PASSWORD="${GELPOINT_DB_PASSWORD:-gelpoint-local-only}"
export GELPOINT_DB_NAME="${GELPOINT_DB_NAME:-gelpoint}"
export GELPOINT_API_PORT="${GELPOINT_API_PORT:-8080}"
export GELPOINT_HOST="${GELPOINT_HOST:-127.0.0.1}"
export MAILSINK_HOST="${MAILSINK_HOST:-127.0.0.1}"
export MAILSINK_SMTP_PORT="${MAILSINK_SMTP_PORT:-2525}"
export MAILSINK_HTTP_PORT="${MAILSINK_HTTP_PORT:-8025}"
export MAILSINK_DATA_DIR="${MAILSINK_DATA_DIR:-$GELPOINT_DATA_DIR/mailsink}"
export SMTP_HOST="${SMTP_HOST:-$MAILSINK_HOST}"
export SMTP_PORT="${SMTP_PORT:-$MAILSINK_SMTP_PORT}"
export GELPOINT_PUBLIC_URL="${GELPOINT_PUBLIC_URL:-http://$GELPOINT_HOST:$GELPOINT_API_PORT}"

# PostgreSQL refuses to run as root: as root the cluster belongs to the postgres user and lives where
# that user can reach it; otherwise it is the caller's own, under the data folder.
if [ "$(id -u)" = 0 ]; then
  GP_PG_ROOT="${GELPOINT_PG_ROOT:-/var/lib/gelpoint/pg-$GELPOINT_PG_PORT}"
else
  GP_PG_ROOT="${GELPOINT_PG_ROOT:-$GELPOINT_DATA_DIR/pg-$GELPOINT_PG_PORT}"
fi
GP_PGDATA="$GP_PG_ROOT/data"
GP_PG_SUPERPW_FILE="$GP_PG_ROOT/superuser-password"

say() { printf '\033[1mgelpoint:\033[0m %s\n' "$*"; }
die() { printf '\033[1;31mgelpoint:\033[0m %s\n' "$*" >&2; exit 1; }

as_pg_owner() {
  if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

db_url() { # db_url DBNAME
  printf 'postgres://%s:%s@127.0.0.1:%s/%s' "$GELPOINT_DB_USER" "$GELPOINT_DB_PASSWORD" "$GELPOINT_PG_PORT" "$1"
}

superuser_psql() { # superuser_psql ARGS... (against the postgres database)
  PGPASSWORD="$(cat "$GP_PG_SUPERPW_FILE")" psql -X -q -v ON_ERROR_STOP=1 -h 127.0.0.1 -p "$GELPOINT_PG_PORT" -U postgres -d postgres "$@"
}

port_in_use() { # port_in_use PORT -> 0 when something listens on 127.0.0.1:PORT
  (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null
}

require_free_port() { # require_free_port PORT WHAT VARIABLE
  if port_in_use "$1"; then
    die "port $1 on 127.0.0.1 ($2) is already in use — stop the other process (npm stop, if it is an earlier Gelpoint) or set $3 to another port."
  fi
}

ensure_apt_package() { # ensure_apt_package PACKAGE CHECK-COMMAND...
  local pkg="$1"; shift
  if "$@" >/dev/null 2>&1; then return 0; fi
  [ "$(id -u)" = 0 ] || die "$pkg is missing: install it with 'sudo apt-get install -y $pkg' and run again."
  say "installing Debian's $pkg (first run only)…"
  if ! DEBIAN_FRONTEND=noninteractive apt-get install -y -q "$pkg" >/dev/null 2>&1; then
    apt-get update -q >/dev/null
    DEBIAN_FRONTEND=noninteractive apt-get install -y -q "$pkg" >/dev/null
  fi
}

pg_bin_dir() {
  local want=""
  [ -f "$GP_PGDATA/PG_VERSION" ] && want="$(cat "$GP_PGDATA/PG_VERSION")"
  if [ -n "$want" ] && [ -x "/usr/lib/postgresql/$want/bin/postgres" ]; then
    echo "/usr/lib/postgresql/$want/bin"; return
  fi
  ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1
}

ensure_node_deps() {
  cd "$GP_ROOT"
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    say "installing npm packages (npm ci)…"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

pg_running() {
  [ -f "$GP_PGDATA/postmaster.pid" ] && as_pg_owner "$(pg_bin_dir)/pg_ctl" -D "$GP_PGDATA" status >/dev/null 2>&1
}

pg_start() {
  ensure_apt_package postgresql test -n "$(ls -d /usr/lib/postgresql/*/bin/postgres 2>/dev/null)"
  ensure_apt_package postgresql-client command -v psql
  local bin; bin="$(pg_bin_dir)"
  if [ ! -f "$GP_PGDATA/PG_VERSION" ]; then
    say "creating the PostgreSQL cluster in $GP_PGDATA…"
    mkdir -p "$GP_PG_ROOT"
    [ "$(id -u)" = 0 ] && chown postgres:postgres "$GP_PG_ROOT"
    chmod 700 "$GP_PG_ROOT"
    local pwtmp; pwtmp="$GP_PG_ROOT/.initdb-pw"
    node -e 'process.stdout.write(require("crypto").randomBytes(24).toString("base64url"))' > "$pwtmp"
    [ "$(id -u)" = 0 ] && chown postgres:postgres "$pwtmp"
    as_pg_owner "$bin/initdb" -D "$GP_PGDATA" -U postgres --pwfile="$pwtmp" \
      --auth-local=scram-sha-256 --auth-host=scram-sha-256 --encoding=UTF8 --no-locale >/dev/null
    mv "$pwtmp" "$GP_PG_SUPERPW_FILE"
    chmod 600 "$GP_PG_SUPERPW_FILE"
  fi
  if pg_running; then
    return 0
  fi
  require_free_port "$GELPOINT_PG_PORT" "PostgreSQL" GELPOINT_PG_PORT
  say "starting PostgreSQL on 127.0.0.1:$GELPOINT_PG_PORT…"
  # The server's allocator asks for huge pages for its big blocks, as the API's and the worker's do: storing a 50 MB
  # upload copies it through several fresh 50 MB buffers, and in 4 kB pages their faults were most of the write
  # (README, "Upload to report"). A value in the environment wins.
  as_pg_owner env GLIBC_TUNABLES="${GLIBC_TUNABLES:-glibc.malloc.hugetlb=1}" "$bin/pg_ctl" -D "$GP_PGDATA" -l "$GP_PG_ROOT/server.log" -w -t 60 \
    -o "-c listen_addresses=127.0.0.1 -p $GELPOINT_PG_PORT -c unix_socket_directories=''" start >/dev/null \
    || { tail -n 20 "$GP_PG_ROOT/server.log" >&2; die "PostgreSQL did not start (log above, full log in $GP_PG_ROOT/server.log)."; }
}

pg_stop() {
  if pg_running; then
    say "stopping PostgreSQL…"
    as_pg_owner "$(pg_bin_dir)/pg_ctl" -D "$GP_PGDATA" -m fast -w stop >/dev/null
  fi
}

ensure_database() { # ensure_database DBNAME [--fresh]
  local name="$1" fresh="${2:-}"
  superuser_psql -v user="$GELPOINT_DB_USER" -v pw="$GELPOINT_DB_PASSWORD" <<'SQL'
SELECT format('CREATE ROLE %I LOGIN PASSWORD %L', :'user', :'pw')
 WHERE NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = :'user') \gexec
SELECT format('ALTER ROLE %I LOGIN PASSWORD %L', :'user', :'pw') \gexec
SQL
  if [ "$fresh" = "--fresh" ]; then
    PGOPTIONS="-c client_min_messages=warning" superuser_psql -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)"
  fi
  superuser_psql -v name="$name" -v user="$GELPOINT_DB_USER" <<'SQL'
SELECT format('CREATE DATABASE %I OWNER %I ENCODING ''UTF8'' TEMPLATE template0', :'name', :'user')
 WHERE NOT EXISTS (SELECT 1 FROM pg_database WHERE datname = :'name') \gexec
SQL
}

ensure_jwt_secret() {
  mkdir -p "$GELPOINT_DATA_DIR"
  local f="$GELPOINT_DATA_DIR/jwt-secret"
  if [ -z "${GELPOINT_JWT_SECRET:-}" ]; then
    if [ ! -s "$f" ]; then
      (umask 077; node -e 'process.stdout.write(require("crypto").randomBytes(48).toString("base64url"))' > "$f")
    fi
    GELPOINT_JWT_SECRET="$(cat "$f")"
  fi
  export GELPOINT_JWT_SECRET
}

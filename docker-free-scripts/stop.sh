#!/usr/bin/env bash
# npm stop: stop the stack started by npm start (if running), then PostgreSQL.
source "$(dirname "$0")/lib.sh"
pidfile="$GELPOINT_DATA_DIR/stack.pid"
if [ -f "$pidfile" ]; then
  pid="$(cat "$pidfile")"
  if kill -0 "$pid" 2>/dev/null; then
    say "stopping the app, worker and mail sink…"
    kill -TERM "$pid"
    for _ in $(seq 1 120); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  fi
  rm -f "$pidfile"
fi
pg_stop
say "stopped."

#!/usr/bin/env bash
# Stops the project's Redis; quiet when it is not running. The append-only file keeps queued jobs.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
load_env
REDIS_PORT="${REDIS_PORT:-6380}"
if [ -f "$REDIS_PID" ] && kill -0 "$(cat "$REDIS_PID")" 2>/dev/null; then
  pid="$(cat "$REDIS_PID")"
  redis-cli -h 127.0.0.1 -p "$REDIS_PORT" shutdown >/dev/null 2>&1 || kill "$pid" || true
  for _ in $(seq 1 40); do kill -0 "$pid" 2>/dev/null || break; sleep 0.25; done
  log "Redis stopped"
else
  log "Redis was not running"
fi
rm -f "$REDIS_PID"

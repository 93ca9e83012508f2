#!/usr/bin/env bash
# Starts the project's own Redis (the job queue's store, BullMQ) on 127.0.0.1 with its data under .data/redis.
# Idempotent like scripts/db-start.sh: a running server is left alone; a stale pid file is cleaned up;
# a port held by something that is not our Redis is reported, not taken over.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
load_env
REDIS_PORT="${REDIS_PORT:-6380}"
ensure_redis_installed
REDIS_SERVER="$(command -v redis-server || echo /usr/bin/redis-server)"
mkdir -p "$REDIS_DATA"

alive() { [ "$(redis-cli -h 127.0.0.1 -p "$REDIS_PORT" ping 2>/dev/null)" = "PONG" ]; }
pid_running() {
  [ -f "$REDIS_PID" ] || return 1
  local pid stat; pid="$(cat "$REDIS_PID" 2>/dev/null || true)"
  [ -n "$pid" ] || return 1
  stat="$(ps -o stat= -p "$pid" 2>/dev/null || true)"
  [ -n "$stat" ] && [[ "$stat" != Z* ]]
}

if alive; then
  if pid_running; then log "Redis already running on 127.0.0.1:$REDIS_PORT"; exit 0; fi
  die "port $REDIS_PORT on 127.0.0.1 answers as a Redis this project did not start; set REDIS_PORT to a free port"
fi
if pid_running; then
  log "Redis process $(cat "$REDIS_PID") exists but does not answer; waiting for it"
  for _ in $(seq 1 20); do alive && exit 0; sleep 0.5; done
  die "Redis (pid $(cat "$REDIS_PID")) does not answer; see $REDIS_LOG or run npm run stop"
fi
rm -f "$REDIS_PID"
if (exec 3<>"/dev/tcp/127.0.0.1/$REDIS_PORT") 2>/dev/null; then
  die "port $REDIS_PORT on 127.0.0.1 is held by another process; set REDIS_PORT to a free port"
fi
log "starting Redis on 127.0.0.1:$REDIS_PORT (data in $REDIS_DATA)"
# Append-only file: queued jobs survive a restart of Redis. noeviction: BullMQ must never lose keys to memory pressure.
"$REDIS_SERVER" --port "$REDIS_PORT" --bind 127.0.0.1 --dir "$REDIS_DATA" --pidfile "$REDIS_PID" \
  --logfile "$REDIS_LOG" --daemonize yes --appendonly yes --save "" --maxmemory-policy noeviction \
  || die "redis-server failed to start; see $REDIS_LOG"
for _ in $(seq 1 40); do alive && break; sleep 0.25; done
alive || die "Redis did not answer within 10 s; see $REDIS_LOG"
log "Redis ready on 127.0.0.1:$REDIS_PORT"

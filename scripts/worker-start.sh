#!/usr/bin/env bash
# Starts one more queue worker in the background (npm run worker), logging to .data/worker-<pid>.log.
# On another host: set DATABASE_* and REDIS_* to the shared MariaDB and Redis, then run this.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
cd "$ROOT"
mkdir -p "$DATA_ROOT"
node scripts/build-engine.mjs >/dev/null || die "bundling the queue worker failed"
log_file="$DATA_ROOT/worker-starting-$$.log"
# nohup execs node, so $! is the worker itself.
nohup node .engine/worker.mjs >>"$log_file" 2>&1 &
starter=$!
for _ in $(seq 1 80); do
  grep -q " ready on " "$log_file" 2>/dev/null && break
  kill -0 "$starter" 2>/dev/null || break
  sleep 0.25
done
if ! grep -q " ready on " "$log_file" 2>/dev/null; then
  tail -5 "$log_file" >&2
  die "the queue worker did not start; see $log_file"
fi
echo "$starter" >"$DATA_ROOT/worker-$starter.pid"
mv -f "$log_file" "$DATA_ROOT/worker-$starter.log"
log "queue worker $starter ready (log: $DATA_ROOT/worker-$starter.log)"

#!/usr/bin/env bash
# One command from a fresh machine to the app with demo data on http://127.0.0.1:3000:
# installs what is missing, starts MariaDB and Redis, migrates, seeds, builds, starts a queue worker and serves.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
. "$(dirname "$0")/lib/deps.sh"
cd "$ROOT"

ensure_node_modules
bash scripts/ensure-env.sh
bash scripts/db-start.sh
bash scripts/redis-start.sh
load_env
npx tsx scripts/db.ts migrate
npx tsx scripts/db.ts seed
bash scripts/services-start.sh

log "building the app"
node scripts/build-engine.mjs >"$DATA_ROOT/build.log" 2>&1 \
  || { cat "$DATA_ROOT/build.log"; die "bundling the engine and the queue worker failed"; }
NEXT_TELEMETRY_DISABLED=1 node node_modules/next/dist/bin/next build >>"$DATA_ROOT/build.log" 2>&1 || { tail -40 "$DATA_ROOT/build.log"; die "build failed; see $DATA_ROOT/build.log"; }

PORT="${PORT:-3000}"
if (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; then
  die "port $PORT on 127.0.0.1 is in use (an earlier npm start?); stop it with npm run stop"
fi
WORKERS="${SCARPLINE_WORKERS:-1}"
for i in $(seq 1 "$WORKERS"); do bash scripts/worker-start.sh; done
cat >&2 <<MSG

  Scarpline is starting on http://127.0.0.1:$PORT
  Demo sign-ins (password: scarpline-demo)
    admin@scarpline.test      administrator: people, projects, members
    engineer@scarpline.test   engineer: sections, materials, runs
    reviewer@scarpline.test   reviewer: reviews and signs off runs
    designer@scarpline.test   designer: sections, runs, slope sweeps
  Queue workers: $WORKERS (npm run worker adds one; SCARPLINE_WORKERS=n npm start starts n).
  Stop with Ctrl-C; npm run stop also stops the workers, Redis and the database.

MSG
echo $$ >"$DATA_ROOT/app.pid"
exec node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$PORT"

#!/usr/bin/env bash
# Runs every test: lint and format check, type check, unit, integration (real MariaDB, the built app over HTTP) and
# end-to-end (Debian's Chromium). Starts what they need and leaves nothing running it started:
# the tests start their own Redis (Debian's redis-server, installed here when missing) and queue workers.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
. "$(dirname "$0")/lib/deps.sh"
cd "$ROOT"

ensure_node_modules
ensure_chromium_installed
ensure_redis_installed
bash scripts/ensure-env.sh

db_was_running=0
mariadb --no-defaults -S "$DB_SOCK" -uroot -e 'select 1' >/dev/null 2>&1 && db_was_running=1
bash scripts/db-start.sh
cleanup() { [ "$db_was_running" = 1 ] || bash scripts/db-stop.sh >/dev/null 2>&1 || true; }
trap cleanup EXIT
load_env

log "lint and format check"
npm run --silent lint || die "lint failed: run npm run lint and fix what it reports"
npm run --silent format:check || die "format check failed: run npm run format"

log "type check"
npx tsc --noEmit -p . || die "type check failed"

log "unit, integration and end-to-end tests"
NEXT_TELEMETRY_DISABLED=1 npx vitest run "$@"

#!/usr/bin/env bash
# Stops what npm start left running: the app server and the project's MariaDB.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
if [ -f "$DATA_ROOT/app.pid" ]; then
  pid="$(cat "$DATA_ROOT/app.pid")"
  if kill -0 "$pid" 2>/dev/null; then kill "$pid" && log "app server stopped"; fi
  rm -f "$DATA_ROOT/app.pid"
fi
bash "$(dirname "$0")/db-stop.sh"

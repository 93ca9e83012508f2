#!/usr/bin/env bash
# Stops what npm start left running: the app server, the queue workers, the S3 and SMTP fakes,
# the project's Redis and MariaDB.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"

# stop_pid FILE LABEL: ends the process a pid file names, waiting a moment for it to go.
stop_pid() {
  local file="$1" label="$2"
  [ -f "$file" ] || return 0
  local pid; pid="$(cat "$file")"
  if kill -0 "$pid" 2>/dev/null; then
    kill "$pid" && for _ in $(seq 1 60); do kill -0 "$pid" 2>/dev/null || break; sleep 0.25; done
    log "$label stopped"
  fi
  rm -f "$file"
}

stop_pid "$DATA_ROOT/app.pid" "app server"
# A worker finishes (or, after 10 s, hands back) its current job before it goes.
for f in "$DATA_ROOT"/worker-*.pid; do [ -e "$f" ] && stop_pid "$f" "queue worker $(cat "$f")"; done
stop_pid "$DATA_ROOT/s3-fake.pid" "S3 fake"
stop_pid "$DATA_ROOT/smtp-fake.pid" "SMTP fake"
bash "$(dirname "$0")/redis-stop.sh"
bash "$(dirname "$0")/db-stop.sh"

#!/usr/bin/env bash
# Stops what npm start left running: the app server, the S3 and SMTP fakes and the project's MariaDB.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
if [ -f "$DATA_ROOT/app.pid" ]; then
  pid="$(cat "$DATA_ROOT/app.pid")"
  if kill -0 "$pid" 2>/dev/null; then kill "$pid" && log "app server stopped"; fi
  rm -f "$DATA_ROOT/app.pid"
fi
if [ -f "$DATA_ROOT/s3-fake.pid" ]; then
  pid="$(cat "$DATA_ROOT/s3-fake.pid")"
  if kill -0 "$pid" 2>/dev/null; then
    kill "$pid" && for _ in $(seq 1 20); do kill -0 "$pid" 2>/dev/null || break; sleep 0.25; done
    log "S3 fake stopped"
  fi
  rm -f "$DATA_ROOT/s3-fake.pid"
fi
if [ -f "$DATA_ROOT/smtp-fake.pid" ]; then
  pid="$(cat "$DATA_ROOT/smtp-fake.pid")"
  if kill -0 "$pid" 2>/dev/null; then
    kill "$pid" && for _ in $(seq 1 20); do kill -0 "$pid" 2>/dev/null || break; sleep 0.25; done
    log "SMTP fake stopped"
  fi
  rm -f "$DATA_ROOT/smtp-fake.pid"
fi
bash "$(dirname "$0")/db-stop.sh"

#!/usr/bin/env bash
# Stops the project's MariaDB; quiet when it is not running.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
if mariadb --no-defaults -S "$DB_SOCK" -uroot -e 'SHUTDOWN' >/dev/null 2>&1; then
  for _ in $(seq 1 60); do
    [ -f "$DB_PID" ] && kill -0 "$(cat "$DB_PID")" 2>/dev/null || break
    sleep 0.5
  done
  log "MariaDB stopped"
else
  if [ -f "$DB_PID" ] && kill -0 "$(cat "$DB_PID")" 2>/dev/null; then
    kill "$(cat "$DB_PID")" || true
    log "MariaDB sent SIGTERM"
  else
    log "MariaDB was not running"
  fi
fi
rm -f "$DB_SOCK" "$DB_SOCK.lock"

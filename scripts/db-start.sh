#!/usr/bin/env bash
# Starts the project's own MariaDB on 127.0.0.1 with its data under .data/.
# Idempotent: a running server is left alone; a stale pid file or socket is cleaned up.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
load_env
DB_PORT="${DATABASE_PORT:-$DB_PORT}"
DB_NAME="${DATABASE_NAME:-scarpline}"
DB_USER="${DATABASE_USER:-scarpline}"
DB_PASSWORD="${DATABASE_PASSWORD:-scarpline-dev}"

ensure_mariadb_installed
MARIADBD="$(command -v mariadbd || echo /usr/sbin/mariadbd)"
mkdir -p "$DATA_ROOT"

root_sql() { mariadb --no-defaults -S "$DB_SOCK" -uroot -N -e "$1"; }
alive() { root_sql 'select 1' >/dev/null 2>&1; }

pid_running() {
  [ -f "$DB_PID" ] || return 1
  local pid; pid="$(cat "$DB_PID" 2>/dev/null || true)"
  [ -n "$pid" ] || return 1
  local stat; stat="$(ps -o stat= -p "$pid" 2>/dev/null || true)"
  # A zombie left by kill -9 still answers kill -0; it is not a server.
  [ -n "$stat" ] && [[ "$stat" != Z* ]]
}

if alive; then
  log "MariaDB already running on 127.0.0.1:$DB_PORT"
else
  if pid_running; then
    log "MariaDB process $(cat "$DB_PID") exists but does not answer; waiting for it"
    for _ in $(seq 1 30); do alive && break; sleep 1; done
    alive || die "MariaDB (pid $(cat "$DB_PID")) does not answer; see $DB_LOG or run npm run db:stop"
  else
    rm -f "$DB_PID" "$DB_SOCK" "$DB_SOCK.lock"
    if (exec 3<>"/dev/tcp/127.0.0.1/$DB_PORT") 2>/dev/null; then
      die "port $DB_PORT on 127.0.0.1 is held by another process; set DATABASE_PORT to a free port"
    fi
    if [ ! -d "$DB_DATA/mysql" ]; then
      log "initialising a new data folder in $DB_DATA"
      mkdir -p "$DB_DATA"
      mariadb-install-db --no-defaults --datadir="$DB_DATA" --user=root \
        --auth-root-authentication-method=socket --skip-test-db >"$DATA_ROOT/mariadb-install.log" 2>&1 \
        || die "mariadb-install-db failed; see $DATA_ROOT/mariadb-install.log"
    fi
    log "starting MariaDB on 127.0.0.1:$DB_PORT"
    nohup "$MARIADBD" --no-defaults --datadir="$DB_DATA" --socket="$DB_SOCK" --pid-file="$DB_PID" \
      --port="$DB_PORT" --bind-address=127.0.0.1 --user=root --skip-name-resolve \
      --innodb-buffer-pool-size=64M --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
      --log-error="$DB_LOG" >/dev/null 2>&1 &
    for _ in $(seq 1 60); do alive && break; sleep 0.5; done
    alive || die "MariaDB did not start within 30 s; see $DB_LOG"
  fi
fi

# The app's user may create and drop the scarpline* databases, which the tests use one per run.
root_sql "CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
  CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
  CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
  GRANT ALL PRIVILEGES ON \`scarpline%\`.* TO '$DB_USER'@'127.0.0.1';
  GRANT ALL PRIVILEGES ON \`scarpline%\`.* TO '$DB_USER'@'localhost';
  FLUSH PRIVILEGES;"
log "MariaDB ready: database $DB_NAME, user $DB_USER"

#!/usr/bin/env bash
# Shared settings for the project's service scripts. Sourced, never run.
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
DATA_ROOT="${SCARPLINE_DATA_DIR:-$ROOT/.data}"
DB_PORT="${DATABASE_PORT:-3307}"
DB_DATA="$DATA_ROOT/mariadb"
DB_SOCK="$DATA_ROOT/mariadb.sock"
DB_PID="$DATA_ROOT/mariadb.pid"
DB_LOG="$DATA_ROOT/mariadb.log"
# The job queue's Redis (BullMQ): its own port and folder, never a system-wide Redis.
REDIS_PORT="${REDIS_PORT:-6380}"
REDIS_DATA="$DATA_ROOT/redis"
REDIS_PID="$DATA_ROOT/redis.pid"
REDIS_LOG="$DATA_ROOT/redis.log"

log() { printf '\033[1;36m[scarpline]\033[0m %s\n' "$*" >&2; }
die() { printf '\033[1;31m[scarpline] error:\033[0m %s\n' "$*" >&2; exit 1; }

apt_updated=0
# Installs Debian packages the first time a script needs them; a fresh machine has neither MariaDB nor Chromium.
apt_install() {
  command -v apt-get >/dev/null || die "apt-get not found: install $* by hand"
  if [ "$apt_updated" = 0 ]; then
    log "apt-get update"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null || die "apt-get update failed"
    apt_updated=1
  fi
  log "apt-get install $*"
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "$@" >/dev/null || die "apt-get install $* failed"
}

ensure_mariadb_installed() {
  if ! command -v mariadbd >/dev/null && [ ! -x /usr/sbin/mariadbd ]; then
    apt_install mariadb-server-core mariadb-client-core
  fi
}

ensure_redis_installed() {
  if ! command -v redis-server >/dev/null && [ ! -x /usr/bin/redis-server ]; then
    apt_install redis-server
  fi
}

ensure_chromium_installed() {
  [ -x /usr/bin/chromium ] || apt_install chromium
}

# Loads .env.local (created by scripts/ensure-env.sh) so every script sees the same settings.
load_env() {
  if [ -f "$ROOT/.env.local" ]; then
    set -a; . "$ROOT/.env.local"; set +a
  fi
}

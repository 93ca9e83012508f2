#!/usr/bin/env bash
# Installs the npm packages when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -f "$ROOT/node_modules/.package-lock.json" ] || [ "$ROOT/package-lock.json" -nt "$ROOT/node_modules/.package-lock.json" ]; then
    log "npm ci"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error) || die "npm ci failed"
  fi
}

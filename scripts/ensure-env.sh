#!/usr/bin/env bash
# Writes .env.local with a fresh NEXTAUTH_SECRET on first use; next-auth answers 500 without one.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
ENV_FILE="$ROOT/.env.local"
if [ ! -f "$ENV_FILE" ]; then
  secret="$(node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("base64url"))')"
  cat >"$ENV_FILE" <<ENV
# Written by scripts/ensure-env.sh; local only, never committed.
NEXTAUTH_SECRET=$secret
NEXTAUTH_URL=http://127.0.0.1:3000
APP_URL=http://127.0.0.1:3000
DATABASE_HOST=127.0.0.1
DATABASE_PORT=${DATABASE_PORT:-3307}
DATABASE_USER=scarpline
DATABASE_PASSWORD=scarpline-dev
DATABASE_NAME=scarpline
ENV
  log "wrote $ENV_FILE"
fi

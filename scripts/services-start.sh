#!/usr/bin/env bash
# Starts the local stand-ins the app talks to in development (beyond MariaDB):
# the S3-compatible fake that keeps uploaded documents (scripts/s3-fake.ts) and the SMTP
# fake that catches the app's e-mail notices (scripts/smtp-fake.ts, listed on /admin/mail).
# Idempotent: a fake that is already running is left alone.
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
load_env
cd "$ROOT"
mkdir -p "$DATA_ROOT"

answers() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# start_fake NAME PORT SCRIPT DESCRIPTION [VAR=value ...]: the fake writes its pid file once it
# listens, so "pid file present and port answering" means ready.
start_fake() {
  local name="$1" port="$2" script="$3" what="$4"; shift 4
  local pid_file="$DATA_ROOT/$name-fake.pid" log_file="$DATA_ROOT/$name-fake.log"
  if [ -f "$pid_file" ] && kill -0 "$(cat "$pid_file")" 2>/dev/null && answers "$port"; then
    log "$name fake already running on 127.0.0.1:$port"
    return
  fi
  if [ -f "$pid_file" ] && ! kill -0 "$(cat "$pid_file")" 2>/dev/null; then rm -f "$pid_file"; fi
  log "starting the $name fake on 127.0.0.1:$port ($what)"
  # node --import tsx keeps one process, so the pid file names the server itself.
  env "$@" nohup node --import tsx "$script" >>"$log_file" 2>&1 &
  local starter=$!
  for _ in $(seq 1 40); do
    [ -f "$pid_file" ] && answers "$port" && break
    kill -0 "$starter" 2>/dev/null || break
    sleep 0.25
  done
  [ -f "$pid_file" ] && answers "$port" || { tail -5 "$log_file" >&2; die "the $name fake did not start within 10 s; see $log_file"; }
}

S3_PORT="${S3_PORT:-4569}"
start_fake s3 "$S3_PORT" scripts/s3-fake.ts "bucket ${S3_BUCKET:-scarpline-documents}" \
  S3_PORT="$S3_PORT" S3_PID_FILE="$DATA_ROOT/s3-fake.pid"

SMTP_PORT="${SMTP_PORT:-2525}"
SMTP_MAIL_DIR="${SMTP_MAIL_DIR:-$DATA_ROOT/mail}"
start_fake smtp "$SMTP_PORT" scripts/smtp-fake.ts "mail kept under $SMTP_MAIL_DIR" \
  SMTP_PORT="$SMTP_PORT" SMTP_PID_FILE="$DATA_ROOT/smtp-fake.pid" SMTP_MAIL_DIR="$SMTP_MAIL_DIR"

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

S3_PORT="${S3_PORT:-4569}"
S3_PID="$DATA_ROOT/s3-fake.pid"
S3_LOG="$DATA_ROOT/s3-fake.log"
s3_answers() { (exec 3<>"/dev/tcp/127.0.0.1/$S3_PORT") 2>/dev/null; }

if [ -f "$S3_PID" ] && kill -0 "$(cat "$S3_PID")" 2>/dev/null && s3_answers; then
  log "S3 fake already running on 127.0.0.1:$S3_PORT"
else
  if [ -f "$S3_PID" ] && ! kill -0 "$(cat "$S3_PID")" 2>/dev/null; then rm -f "$S3_PID"; fi
  log "starting the S3 fake on 127.0.0.1:$S3_PORT (bucket ${S3_BUCKET:-scarpline-documents})"
  # node --import tsx keeps one process, so the pid file names the server itself.
  S3_PORT="$S3_PORT" S3_PID_FILE="$S3_PID" nohup node --import tsx scripts/s3-fake.ts >>"$S3_LOG" 2>&1 &
  starter=$!
  # Ready once the pid file is written: the fake writes it after the bucket exists and it listens.
  for _ in $(seq 1 40); do
    [ -f "$S3_PID" ] && s3_answers && break
    kill -0 "$starter" 2>/dev/null || break
    sleep 0.25
  done
  [ -f "$S3_PID" ] && s3_answers || { tail -5 "$S3_LOG" >&2; die "the S3 fake did not start within 10 s; see $S3_LOG"; }
fi

SMTP_PORT="${SMTP_PORT:-2525}"
SMTP_PID="$DATA_ROOT/smtp-fake.pid"
SMTP_LOG="$DATA_ROOT/smtp-fake.log"
SMTP_MAIL_DIR="${SMTP_MAIL_DIR:-$DATA_ROOT/mail}"
smtp_answers() { (exec 3<>"/dev/tcp/127.0.0.1/$SMTP_PORT") 2>/dev/null; }

if [ -f "$SMTP_PID" ] && kill -0 "$(cat "$SMTP_PID")" 2>/dev/null && smtp_answers; then
  log "SMTP fake already running on 127.0.0.1:$SMTP_PORT"
else
  if [ -f "$SMTP_PID" ] && ! kill -0 "$(cat "$SMTP_PID")" 2>/dev/null; then rm -f "$SMTP_PID"; fi
  log "starting the SMTP fake on 127.0.0.1:$SMTP_PORT (mail kept under $SMTP_MAIL_DIR)"
  SMTP_PORT="$SMTP_PORT" SMTP_PID_FILE="$SMTP_PID" SMTP_MAIL_DIR="$SMTP_MAIL_DIR" nohup node --import tsx scripts/smtp-fake.ts >>"$SMTP_LOG" 2>&1 &
  starter=$!
  for _ in $(seq 1 40); do
    [ -f "$SMTP_PID" ] && smtp_answers && break
    kill -0 "$starter" 2>/dev/null || break
    sleep 0.25
  done
  [ -f "$SMTP_PID" ] && smtp_answers || { tail -5 "$SMTP_LOG" >&2; die "the SMTP fake did not start within 10 s; see $SMTP_LOG"; }
fi

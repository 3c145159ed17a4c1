#!/usr/bin/env bash
# Local services for the demo and the tests, all on loopback: PostgreSQL, the fake SMTP server and the fake S3 store.
#   scripts/services.sh start | stop
# PIDs and logs live in .data/run (git-ignored). Start is idempotent.
set -euo pipefail
cd "$(dirname "$0")/.."
RUN=.data/run
mkdir -p "$RUN"

SMTP_FAKE_PORT="${SMTP_FAKE_PORT:-2525}"
MAILBOX_PORT="${MAILBOX_PORT:-2526}"
S3_FAKE_PORT="${S3_FAKE_PORT:-4566}"

alive() { [ -f "$1" ] && kill -0 "$(cat "$1")" 2>/dev/null; }

wait_for_port() {
  local port="$1" what="$2"
  for _ in $(seq 1 100); do
    (echo >"/dev/tcp/127.0.0.1/$port") 2>/dev/null && return 0
    sleep 0.1
  done
  echo "[services] $what did not open port $port; see $RUN" >&2
  exit 1
}

start_smtp() {
  if alive "$RUN/smtp.pid"; then echo "[services] fake SMTP already running" >&2; return; fi
  SMTP_FAKE_PORT="$SMTP_FAKE_PORT" MAILBOX_PORT="$MAILBOX_PORT" \
    nohup node_modules/.bin/tsx scripts/smtp-fake.ts >"$RUN/smtp.log" 2>&1 &
  echo $! >"$RUN/smtp.pid"
  wait_for_port "$SMTP_FAKE_PORT" "fake SMTP"
  wait_for_port "$MAILBOX_PORT" "mailbox API"
  echo "[services] fake SMTP on 127.0.0.1:$SMTP_FAKE_PORT, mailbox on 127.0.0.1:$MAILBOX_PORT" >&2
}

start_s3() {
  if alive "$RUN/s3.pid"; then echo "[services] fake S3 already running" >&2; return; fi
  S3_FAKE_PORT="$S3_FAKE_PORT" nohup node_modules/.bin/tsx scripts/s3-fake.ts >"$RUN/s3.log" 2>&1 &
  echo $! >"$RUN/s3.pid"
  wait_for_port "$S3_FAKE_PORT" "fake S3"
  echo "[services] fake S3 on 127.0.0.1:$S3_FAKE_PORT (objects in .data/s3)" >&2
}

stop_pid() {
  if alive "$1"; then kill "$(cat "$1")" 2>/dev/null || true; fi
  rm -f "$1"
}

case "${1:-}" in
  start) bash scripts/pg.sh start; start_smtp; start_s3 ;;
  stop) stop_pid "$RUN/s3.pid"; stop_pid "$RUN/smtp.pid"; bash scripts/pg.sh stop ;;
  *) echo "usage: scripts/services.sh start|stop" >&2; exit 2 ;;
esac

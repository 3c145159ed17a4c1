#!/usr/bin/env bash
# npm run demo: install if needed, start PostgreSQL, the fake SMTP server and the fake S3 store on loopback, migrate, seed,
# build, and serve Branchline on http://localhost:3000 (PORT to change). Ctrl-C stops everything it started.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib.sh

PORT="${PORT:-3000}"
ensure_dependencies
bash scripts/services.sh start
trap 'bash scripts/services.sh stop' EXIT
# Attachments go to the fake S3 store on loopback unless another S3-compatible store is configured.
export S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:${S3_FAKE_PORT:-4566}}"
export S3_BUCKET="${S3_BUCKET:-branchline-demo}"
export S3_ACCESS_KEY_ID="${S3_ACCESS_KEY_ID:-branchline-local}"
export S3_SECRET_ACCESS_KEY="${S3_SECRET_ACCESS_KEY:-branchline-local-secret}"
export S3_FORCE_PATH_STYLE="${S3_FORCE_PATH_STYLE:-true}"

# The seed prints a share link and mails an invitation: both point at this address, and the mail goes to the fake.
export NEXTAUTH_URL="http://localhost:$PORT"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:${SMTP_FAKE_PORT:-2525}}"
npm run --silent db:migrate
npm run --silent db:seed
echo "[demo] building (about half a minute)" >&2
node_modules/.bin/next build >.data/run/build.log 2>&1 || { tail -40 .data/run/build.log; exit 1; }

# One parameter-map worker beside the server (more: `npm run worker` in other terminals, or on other machines
# with DATABASE_URL pointing here). It stops with the demo.
node_modules/.bin/tsx --conditions react-server scripts/worker.ts >.data/run/worker.log 2>&1 &
worker_pid=$!
trap 'kill "$worker_pid" 2>/dev/null || true; bash scripts/services.sh stop' EXIT
echo "[demo] one map worker running (pid $worker_pid, log in .data/run/worker.log)" >&2

export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-$(ensure_secret)}"
export BRANCHLINE_MAILBOX_URL="http://127.0.0.1:${MAILBOX_PORT:-2526}"

cat <<MSG

  Branchline is starting on http://localhost:$PORT

  Demo owner (also site administrator):  owner@lindenbrook.example    / lindenbrook-demo-owner
  Demo viewer (read-only):               referee@lindenbrook.example  / lindenbrook-demo-viewer
  Mail sent by the demo (sign-in links, password resets):  http://localhost:$PORT/dev/mailbox
    (signed in as the site administrator, from this machine only)

MSG
node_modules/.bin/next start -p "$PORT"

#!/usr/bin/env bash
# npm test: install if needed, start what the tests need on loopback, run unit, integration and e2e tests
# (Playwright in Debian's Chromium), and stop what it started.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib.sh

ensure_dependencies
if [ ! -x /usr/bin/chromium ]; then
  if [ "$(id -u)" -eq 0 ]; then
    echo "[test] installing Debian's chromium" >&2
    DEBIAN_FRONTEND=noninteractive apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  else
    echo "[test] /usr/bin/chromium is missing: apt-get install chromium" >&2; exit 1
  fi
fi

# Stop afterwards only what this run started.
pg_was_running=$(bash scripts/pg.sh status 2>/dev/null || true)
smtp_was_running=no
[ -f .data/run/smtp.pid ] && kill -0 "$(cat .data/run/smtp.pid)" 2>/dev/null && smtp_was_running=yes
s3_was_running=no
[ -f .data/run/s3.pid ] && kill -0 "$(cat .data/run/s3.pid)" 2>/dev/null && s3_was_running=yes
bash scripts/services.sh start
cleanup() {
  [ -n "${E2E_DB:-}" ] && bash scripts/pg.sh dropdb "$E2E_DB" >/dev/null 2>&1 || true
  if [ "$smtp_was_running" = no ] && [ -f .data/run/smtp.pid ]; then
    kill "$(cat .data/run/smtp.pid)" 2>/dev/null || true
    rm -f .data/run/smtp.pid
  fi
  if [ "$s3_was_running" = no ] && [ -f .data/run/s3.pid ]; then
    kill "$(cat .data/run/s3.pid)" 2>/dev/null || true
    rm -f .data/run/s3.pid
  fi
  [ "$pg_was_running" = running ] || bash scripts/pg.sh stop
}
trap cleanup EXIT
# The object store the app, the integration tests and the browser tests use: the fake on loopback unless set.
export S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:${S3_FAKE_PORT:-4566}}"
export S3_BUCKET="${S3_BUCKET:-branchline-test}"
export S3_ACCESS_KEY_ID="${S3_ACCESS_KEY_ID:-branchline-local}"
export S3_SECRET_ACCESS_KEY="${S3_SECRET_ACCESS_KEY:-branchline-local-secret}"
export S3_FORCE_PATH_STYLE="${S3_FORCE_PATH_STYLE:-true}"

echo "[test] type check" >&2
node_modules/.bin/tsc --noEmit
echo "[test] unit tests" >&2
node_modules/.bin/vitest run --project unit
echo "[test] integration tests (real PostgreSQL, fresh database)" >&2
node_modules/.bin/vitest run --project integration

echo "[test] building for the browser tests" >&2
mkdir -p .data/run
node_modules/.bin/next build >.data/run/build.log 2>&1 || { tail -60 .data/run/build.log; exit 1; }
E2E_DB="branchline_e2e_$$"
if [ -z "${DATABASE_URL:-}" ]; then
  bash scripts/pg.sh createdb "$E2E_DB"
  export E2E_DATABASE_URL="postgres://postgres@127.0.0.1:${BRANCHLINE_PG_PORT:-55432}/$E2E_DB"
else
  E2E_DB=""
  export E2E_DATABASE_URL="$DATABASE_URL"
fi
DATABASE_URL="$E2E_DATABASE_URL" node_modules/.bin/tsx scripts/migrate.ts
echo "[test] browser tests (Debian's Chromium)" >&2
node_modules/.bin/playwright test

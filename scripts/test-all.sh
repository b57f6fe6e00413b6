#!/usr/bin/env bash
# Quick start, second command: every test. Type-check, lint, unit tests (engine included), then
# integration and end-to-end tests against a MariaDB instance, a mail service, a job worker and an app build of
# their own (own ports, own data directory, throw-away database), so the demo data is never touched
# and a running demo keeps running. Ends with one summary line.
set -uo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1 CI="${CI:-}"

ensure_debian_packages mariadb-server mariadb-client chromium fonts-noto-core
ensure_node_modules

free_port() { local p="$1"; while port_in_use "$p"; do p=$((p + 1)); done; echo "$p"; }
RESULTS="$TMPDIR/test-results"; rm -rf "$RESULTS"; mkdir -p "$RESULTS"
STEPS_FAILED=()
step() { # step NAME COMMAND... — runs one stage, records its outcome, keeps going
  local name="$1"; shift
  say "$name"
  if "$@"; then echo "$name: ok"; else echo "$name: FAILED"; STEPS_FAILED+=("$name"); fi
}

step "type-check" npx tsc --noEmit -p tsconfig.json
step "lint" npx eslint . --max-warnings=0
step "unit tests" npx vitest run --project unit --reporter=default --reporter=json --outputFile.json="$RESULTS/unit.json"

# ---- services of the test run's own --------------------------------------------------------------
export DB_PORT; DB_PORT="$(free_port "${TEST_DB_PORT:-3317}")"
export DB_DATA_DIR="$ROOT/.data/test-mariadb"
export DB_NAME="thawline_test_$$"
export SMTP_PORT; SMTP_PORT="$(free_port "${TEST_SMTP_PORT:-2626}")"
export MAIL_STORE_DIR="$TMPDIR/test-mail-$$"
APP_PORT="$(free_port "${TEST_APP_PORT:-3100}")"
export APP_URL="http://localhost:$APP_PORT" E2E_BASE_URL="http://localhost:$APP_PORT"
export DEV_INBOX=1 NEXT_DIST_DIR=.next-test

cleanup() {
  [ -n "${APP_PID:-}" ] && kill -- "-$APP_PID" 2>/dev/null
  [ -n "${WORKER_PID:-}" ] && kill -- "-$WORKER_PID" 2>/dev/null
  [ -n "${MAIL_PID:-}" ] && kill -- "-$MAIL_PID" 2>/dev/null
  bash scripts/db.sh sql -e "DROP DATABASE IF EXISTS \`$DB_NAME\`" >/dev/null 2>&1
  # Throw-away databases of integration tests that were interrupted.
  for d in $(bash scripts/db.sh sql -N -e "SHOW DATABASES LIKE 'thawline\\_test\\_%'" 2>/dev/null); do
    bash scripts/db.sh sql -e "DROP DATABASE IF EXISTS \`$d\`" >/dev/null 2>&1
  done
  bash scripts/db.sh stop >/dev/null 2>&1
  rm -rf "$MAIL_STORE_DIR"
}
trap cleanup EXIT

services_ok=1
bash scripts/db.sh start || services_ok=0
if [ "$services_ok" = 1 ]; then
  npx tsx --require ./scripts/server-process.cjs scripts/migrate.ts && npx tsx --require ./scripts/server-process.cjs scripts/seed.ts || services_ok=0
fi
setsid npx tsx --require ./scripts/server-process.cjs scripts/mail-server.ts >"$TMPDIR/test-mail.log" 2>&1 </dev/null &
MAIL_PID=$!
if [ "$services_ok" = 1 ]; then
  setsid npx tsx --require ./scripts/server-process.cjs scripts/worker.ts >"$TMPDIR/test-worker.log" 2>&1 </dev/null &
  WORKER_PID=$!
fi
say "Building the app for the tests"
if [ "$services_ok" = 1 ] && npm run --silent build >"$TMPDIR/test-build.log" 2>&1; then
  setsid npx next start -p "$APP_PORT" >"$TMPDIR/test-app.log" 2>&1 </dev/null &
  APP_PID=$!
  node scripts/wait-for-url.mjs "$E2E_BASE_URL/api/health" 90 "$APP_PID" || { echo "the test app did not become healthy; see $TMPDIR/test-app.log"; tail -n 20 "$TMPDIR/test-app.log"; services_ok=0; }
else
  echo "the test app could not be built or its services did not start; see $TMPDIR/test-build.log"; tail -n 30 "$TMPDIR/test-build.log"
  services_ok=0
fi

if [ "$services_ok" = 1 ]; then
  step "integration tests" npx vitest run --project integration --reporter=default --reporter=json --outputFile.json="$RESULTS/integration.json"
  PLAYWRIGHT_JSON_OUTPUT_NAME="$RESULTS/e2e.json" step "end-to-end tests" npx playwright test --reporter=list,json
else
  STEPS_FAILED+=("test services")
fi

node scripts/test-summary.mjs "$RESULTS" "${STEPS_FAILED[@]}"

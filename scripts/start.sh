#!/usr/bin/env bash
# Quick start, first command: installs what is missing, prepares and seeds the database, starts the
# local mail service and a job worker (outlook runs), builds the app and serves it on http://localhost:3000 with the demo data.
# Safe to run again: data in .data/ is kept, a previous run's app and mail service are replaced.
set -euo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1

APP_PORT="${APP_PORT:-3000}"
export DB_PORT="${DB_PORT:-3307}" SMTP_PORT="${SMTP_PORT:-2525}"
export MAIL_STORE_DIR="${MAIL_STORE_DIR:-$ROOT/.data/mail}" DEV_INBOX="${DEV_INBOX:-1}"
export APP_URL="${APP_URL:-http://localhost:$APP_PORT}"
check_port APP_PORT "$APP_PORT"; check_port DB_PORT "$DB_PORT"; check_port SMTP_PORT "$SMTP_PORT"
mkdir -p .data

stop_pidfile() {
  local f="$1"
  if [ -f "$f" ]; then
    local pid; pid="$(cat "$f")"
    if kill -0 "$pid" 2>/dev/null; then kill -- "-$pid" 2>/dev/null || kill "$pid" 2>/dev/null || true; sleep 1; fi
    rm -f "$f"
  fi
}

# A previous run of this script is replaced; anything else on our ports is reported, not killed.
stop_pidfile .data/app.pid
stop_pidfile .data/mail.pid
stop_pidfile .data/worker.pid
port_in_use "$APP_PORT" && fail "port $APP_PORT is taken by another program; stop it or run with APP_PORT=<free port>"
port_in_use "$SMTP_PORT" && fail "mail port $SMTP_PORT is taken by another program; stop it or run with SMTP_PORT=<free port>"

ensure_node_modules
bash scripts/db.sh start
say "Applying migrations"
npx tsx --require ./scripts/server-process.cjs scripts/migrate.ts
say "Seeding the invented demo region"
npx tsx --require ./scripts/server-process.cjs scripts/seed.ts

say "Starting the local mail service on 127.0.0.1:$SMTP_PORT"
setsid npx tsx --require ./scripts/server-process.cjs scripts/mail-server.ts >.data/mail.log 2>&1 </dev/null &
echo $! >.data/mail.pid

say "Starting a job worker (log: .data/worker.log)"
setsid npx tsx --require ./scripts/server-process.cjs scripts/worker.ts --concurrency "${WORKER_CONCURRENCY:-1}" >.data/worker.log 2>&1 </dev/null &
echo $! >.data/worker.pid

say "Building the app (about a minute)"
npm run --silent build >.data/build.log 2>&1 || fail "the build failed; see .data/build.log"

say "Starting Thawline on $APP_URL"
setsid npx next start -p "$APP_PORT" >.data/app.log 2>&1 </dev/null &
echo $! >.data/app.pid
node scripts/wait-for-url.mjs "http://127.0.0.1:$APP_PORT/api/health" 90 "$(cat .data/app.pid)" \
  || fail "the app did not become healthy; see .data/app.log and $APP_URL/api/health"

npx tsx --require ./scripts/server-process.cjs scripts/print-demo-sign-ins.ts "$APP_URL"
cat <<MSG

Thawline is running on $APP_URL (log: .data/app.log).
Mail sent by the app is kept by the local mail service: read it at $APP_URL/dev/inbox
Outlooks run in the job worker (log: .data/worker.log); more workers: npm run worker, on any machine.
Stop everything: npm run stop     (the database alone: npm run db:stop)
MSG

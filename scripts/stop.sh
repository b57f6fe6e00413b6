#!/usr/bin/env bash
# Stops what scripts/start.sh started: the app, the job worker, the mail service and the database. Data stays in .data/.
set -euo pipefail
source "$(dirname "$0")/common.sh"
cd "$ROOT"
for name in app worker mail; do
  f=".data/$name.pid"
  if [ -f "$f" ]; then
    pid="$(cat "$f")"
    kill -- "-$pid" 2>/dev/null || kill "$pid" 2>/dev/null || true
    rm -f "$f"
    say "stopped the $name"
  fi
done
bash scripts/db.sh stop

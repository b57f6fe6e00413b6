#!/usr/bin/env bash
# The project's own MariaDB: private data directory, loopback only, its own port and socket.
#   scripts/db.sh start|stop|status     (DB_PORT, DB_DATA_DIR, DB_NAME, DB_USER, DB_PASSWORD from the environment)
# It never uses a server the machine happens to run.
set -euo pipefail
source "$(dirname "$0")/common.sh"

DB_PORT="${DB_PORT:-3307}"
DB_DATA_DIR="${DB_DATA_DIR:-$ROOT/.data/mariadb}"
DB_NAME="${DB_NAME:-thawline}"
DB_USER="${DB_USER:-thawline}"
DB_PASSWORD="${DB_PASSWORD:-thawline-local}"
check_port DB_PORT "$DB_PORT"
RUN="$DB_DATA_DIR/run"
SOCK="$RUN/mysqld.sock"
PIDFILE="$RUN/mysqld.pid"
ERRLOG="$DB_DATA_DIR/mariadbd.err"

client() { mariadb --no-defaults --socket="$SOCK" -uroot "$@"; }
running() { [ -S "$SOCK" ] && mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; }

start() {
  ensure_debian_packages mariadb-server mariadb-client
  mkdir -p "$RUN"
  if running; then
    say "MariaDB already running on 127.0.0.1:$DB_PORT ($DB_DATA_DIR)"
  else
    if [ ! -d "$DB_DATA_DIR/data/mysql" ]; then
      if [ -d "$DB_DATA_DIR/data" ] && [ -n "$(ls -A "$DB_DATA_DIR/data" 2>/dev/null)" ]; then
        fail "$DB_DATA_DIR/data is not a MariaDB data directory (damaged?); move it away or delete it to start afresh"
      fi
      say "Initialising a private MariaDB data directory in $DB_DATA_DIR"
      mariadb-install-db --no-defaults --user=root --datadir="$DB_DATA_DIR/data" \
        --auth-root-authentication-method=socket --skip-test-db >"$DB_DATA_DIR/install.log" 2>&1 \
        || fail "mariadb-install-db failed; see $DB_DATA_DIR/install.log"
    fi
    if port_in_use "$DB_PORT"; then
      fail "port $DB_PORT is taken by another program; set DB_PORT to a free port (e.g. DB_PORT=3317)"
    fi
    rm -f "$SOCK" "$PIDFILE"
    # setsid: the server outlives this script and the terminal that started it.
    setsid /usr/sbin/mariadbd --no-defaults --user=root --datadir="$DB_DATA_DIR/data" \
      --bind-address=127.0.0.1 --port="$DB_PORT" --socket="$SOCK" --pid-file="$PIDFILE" \
      --log-error="$ERRLOG" --skip-name-resolve --character-set-server=utf8mb4 \
      --collation-server=utf8mb4_unicode_ci --innodb-buffer-pool-size=128M \
      --innodb-log-file-size=48M </dev/null >/dev/null 2>&1 &
    for _ in $(seq 1 300); do
      running && break
      if ! kill -0 $! 2>/dev/null; then
        fail "MariaDB did not start (damaged data directory $DB_DATA_DIR?); last lines of $ERRLOG: $(tail -n 3 "$ERRLOG" 2>/dev/null | tr '\n' ' ')"
      fi
      sleep 0.1
    done
    running || fail "MariaDB did not answer within 30 s; see $ERRLOG"
    say "MariaDB running on 127.0.0.1:$DB_PORT"
  fi
  # Idempotent: the application's database and its own user (password over TCP; root stays socket-only).
  client <<SQL || fail "could not create database $DB_NAME; see $ERRLOG"
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'localhost';
GRANT ALL PRIVILEGES ON \`thawline\\_test\\_%\`.* TO '$DB_USER'@'127.0.0.1';
FLUSH PRIVILEGES;
SQL
}

stop() {
  if running; then
    mariadb-admin --no-defaults --socket="$SOCK" -uroot shutdown && say "MariaDB on port $DB_PORT stopped"
  else
    say "MariaDB ($DB_DATA_DIR) is not running"
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) if running; then echo "running on 127.0.0.1:$DB_PORT"; else echo "stopped"; exit 1; fi ;;
  sql) shift; client "$@" ;;
  *) echo "usage: scripts/db.sh start|stop|status|sql" >&2; exit 2 ;;
esac

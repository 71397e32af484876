#!/usr/bin/env bash
# Starts the project's private MariaDB on 127.0.0.1:$BAYWALK_DB_PORT (3307),
# with its data under .data/mariadb. Safe to run again: when the server is
# already up it only makes sure the databases and the user exist.
# Usage: db-up.sh [extra database names to create…]
set -euo pipefail
source "$(dirname "$0")/env.sh"

ensure_apt mariadbd mariadb-server-core mariadb mariadb-client

DATADIR="$BAYWALK_DATA_DIR/mariadb"
RUNDIR="$BAYWALK_DATA_DIR/run"
# Each server gets its own temporary directory: several private servers
# (tests, benchmarks, clones) sharing /tmp can trip over each other's files.
TMPDIR_DB="$BAYWALK_DATA_DIR/tmp"
mkdir -p "$RUNDIR" "$TMPDIR_DB"
PIDFILE="$RUNDIR/mariadb.pid"
LOG="$RUNDIR/mariadb.err"
# Unix socket paths are limited to ~107 bytes: fall back to /tmp when deep.
SOCK="$RUNDIR/mariadb.sock"
if [ ${#SOCK} -gt 100 ]; then
  SOCK="/tmp/baywalk-$(printf '%s' "$RUNDIR" | md5sum | cut -c1-10).sock"
fi
echo "$SOCK" > "$RUNDIR/socket-path"

ROOT_OPT=()
[ "$(id -u)" = 0 ] && ROOT_OPT=(--user=root)

# A process is alive when /proc says so and it is not a zombie.
alive() {
  local pid="$1"
  [ -n "$pid" ] && [ -r "/proc/$pid/stat" ] || return 1
  local state
  state=$(awk '{print $3}' "/proc/$pid/stat" 2>/dev/null || echo Z)
  [ "$state" != Z ] && [ "$state" != X ]
}

ping_db() { mariadb-admin --no-defaults -S "$SOCK" -uroot ping >/dev/null 2>&1; }

port_in_use() { (exec 3<>"/dev/tcp/127.0.0.1/$BAYWALK_DB_PORT") 2>/dev/null; }

# 1. A data directory, made atomically: initialise beside it, then rename.
if [ ! -d "$DATADIR/mysql" ]; then
  rm -rf "$DATADIR"
  TMP="$BAYWALK_DATA_DIR/mariadb.init.$$"
  rm -rf "$BAYWALK_DATA_DIR"/mariadb.init.*
  say "initialising the database files in $DATADIR"
  mariadb-install-db --no-defaults --datadir="$TMP" "${ROOT_OPT[@]}" --skip-test-db \
    --auth-root-authentication-method=socket >"$RUNDIR/install-db.log" 2>&1 \
    || { rm -rf "$TMP"; die "mariadb-install-db failed; see $RUNDIR/install-db.log"; }
  mv "$TMP" "$DATADIR"
fi

# 2. The server, unless ours is already running.
PID=$(cat "$PIDFILE" 2>/dev/null || true)
if alive "$PID" && ping_db; then
  :
else
  if alive "$PID"; then
    # Ours but not answering yet (starting, or recovering after kill -9).
    for _ in $(seq 1 100); do ping_db && break; sleep 0.1; done
  fi
  if ! ping_db; then
    if port_in_use; then
      die "port $BAYWALK_DB_PORT on 127.0.0.1 is taken by another program; set BAYWALK_DB_PORT to a free port"
    fi
    rm -f "$PIDFILE" "$SOCK"
    say "starting MariaDB on 127.0.0.1:$BAYWALK_DB_PORT"
    setsid mariadbd --no-defaults --datadir="$DATADIR" "${ROOT_OPT[@]}" \
      --bind-address=127.0.0.1 --port="$BAYWALK_DB_PORT" --socket="$SOCK" \
      --pid-file="$PIDFILE" --log-error="$LOG" --skip-name-resolve --tmpdir="$TMPDIR_DB" \
      --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
      --innodb-buffer-pool-size=256M --max-connections=500 \
      </dev/null >/dev/null 2>&1 &
    for _ in $(seq 1 300); do ping_db && break; sleep 0.1; done
    ping_db || die "MariaDB did not start within 30 s; see $LOG"
  fi
fi

# 3. Databases and the application user (idempotent).
DBS=("$BAYWALK_DB_NAME" "$@")
SQL="CREATE USER IF NOT EXISTS '$BAYWALK_DB_USER'@'127.0.0.1' IDENTIFIED BY '$BAYWALK_DB_PASSWORD';"
SQL+="ALTER USER '$BAYWALK_DB_USER'@'127.0.0.1' IDENTIFIED BY '$BAYWALK_DB_PASSWORD';"
for db in "${DBS[@]}"; do
  SQL+="CREATE DATABASE IF NOT EXISTS \`$db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
  SQL+="GRANT ALL PRIVILEGES ON \`$db\`.* TO '$BAYWALK_DB_USER'@'127.0.0.1';"
done
mariadb --no-defaults -S "$SOCK" -uroot -e "$SQL" || die "could not create the databases and user"
say "MariaDB ready on 127.0.0.1:$BAYWALK_DB_PORT (databases: ${DBS[*]})"

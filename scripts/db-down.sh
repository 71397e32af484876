#!/usr/bin/env bash
# Stops the project's private MariaDB cleanly (no-op when it is not running).
set -euo pipefail
source "$(dirname "$0")/env.sh"
RUNDIR="$BAYWALK_DATA_DIR/run"
PIDFILE="$RUNDIR/mariadb.pid"
PID=$(cat "$PIDFILE" 2>/dev/null || true)
if [ -z "$PID" ] || [ ! -r "/proc/$PID/stat" ]; then
  say "MariaDB is not running"; exit 0
fi
kill -TERM "$PID" 2>/dev/null || true
for _ in $(seq 1 200); do
  state=$(awk '{print $3}' "/proc/$PID/stat" 2>/dev/null || echo gone)
  { [ "$state" = gone ] || [ "$state" = Z ]; } && break
  sleep 0.1
done
[ -r "/proc/$PID/stat" ] && [ "$(awk '{print $3}' "/proc/$PID/stat")" != Z ] && { kill -KILL "$PID" 2>/dev/null || true; }
rm -f "$PIDFILE"
say "MariaDB stopped"

#!/usr/bin/env bash
# Measures `npm start` from a fresh clone: cold (nothing installed or built)
# and warm (second start), as seconds until /api/health answers 200.
# Usage: scripts/measure-startup.sh [clone-dir]   (uses ports 8097 and 3397)
set -euo pipefail
SRC="$(cd "$(dirname "$0")/.." && pwd)"
DIR="${1:-/tmp/baywalk-startup-clone}"
export PORT=8097 BAYWALK_DB_PORT=3397
rm -rf "$DIR"
git clone -q "$SRC" "$DIR"
cd "$DIR"

time_start() {
  local t0 t1
  t0=$(date +%s.%N)
  # Its own process group, so the stop below is what Ctrl-C does in a terminal.
  setsid npm start > "$DIR/start-$1.log" 2>&1 &
  local pid=$!
  until curl -sf "http://127.0.0.1:$PORT/api/health" >/dev/null; do
    kill -0 $pid 2>/dev/null || { echo "npm start died; see $DIR/start-$1.log"; exit 1; }
    sleep 0.2
  done
  t1=$(date +%s.%N)
  printf '%s start: %.1f s to a healthy server\n' "$1" "$(echo "$t1 - $t0" | bc)"
  kill -INT -- -$pid
  wait $pid 2>/dev/null || true
  # The server may still be closing connections: wait until the port is free.
  while curl -sf "http://127.0.0.1:$PORT/api/health" >/dev/null; do sleep 0.2; done
}

time_start cold
time_start warm
bash scripts/db-down.sh >/dev/null

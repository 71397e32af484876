#!/usr/bin/env bash
# npm run dev: the API server plus the Expo dev server (with /api proxied), offline.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
ensure_node_modules
bash scripts/db-up.sh
npx tsx scripts/migrate.ts
npx tsx scripts/seed-demo.ts
export PORT="${PORT:-8080}"
npx tsx watch server/main.ts &
API=$!
trap 'kill $API 2>/dev/null || true' EXIT INT TERM
EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 EXPO_UNSTABLE_HEADLESS=1 npx expo start --web --localhost

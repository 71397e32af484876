#!/usr/bin/env bash
# npm start: packages, private MariaDB, schema, demo data, web build, then the server.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"

ensure_node_modules
bash scripts/db-up.sh
npx tsx scripts/migrate.ts
npx tsx scripts/seed-demo.ts
ensure_web_build

export PORT="${PORT:-8080}"
say "serving on http://127.0.0.1:$PORT  (Ctrl-C stops the server; 'npm run db:down' stops the database)"
# node itself, not an npx wrapper: Ctrl-C and SIGTERM then reach the server directly.
exec node --import tsx server/main.ts

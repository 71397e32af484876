#!/usr/bin/env bash
# Exports the Expo web app to dist/ without touching the network.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
TMP="dist.tmp.$$"
trap 'rm -rf "$TMP"' EXIT
CI=1 EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 npx expo export --platform web --output-dir "$TMP"
# Every page loads every layout chunk (Expo Router's async routes fetch them
# only once the entry has run): preload them with the page instead.
PRELOADS=""
for f in "$TMP"/_expo/static/js/web/_layout-*.js; do
  [ -e "$f" ] && PRELOADS="$PRELOADS<link rel=\"preload\" href=\"/_expo/static/js/web/$(basename "$f")\" as=\"script\">"
done
if [ -n "$PRELOADS" ]; then
  grep -q '</head>' "$TMP/index.html" || die "the exported index.html has no </head>"
  PRELOADS="$PRELOADS" node -e 'const fs=require("fs");const f=process.argv[1];fs.writeFileSync(f,fs.readFileSync(f,"utf8").replace("</head>",process.env.PRELOADS+"</head>"))' "$TMP/index.html"
fi
# public/early-requests.js preloads the walk screen's route chunk on /walks/<id>
# (otherwise fetched only once the session is known): write in its hashed name.
# It is the [id] chunk that calls useStaffWalkSource (property names survive minifying).
WALK_CHUNK="$(grep -l 'useStaffWalkSource' "$TMP"/_expo/static/js/web/\[id\]-*.js | head -n 1 || true)"
[ -n "$WALK_CHUNK" ] || die "could not find the walk screen's route chunk"
grep -q '__WALK_ROUTE_CHUNK__' "$TMP/early-requests.js" || die "public/early-requests.js has no __WALK_ROUTE_CHUNK__"
sed -i "s#__WALK_ROUTE_CHUNK__#/_expo/static/js/web/$(basename "$WALK_CHUNK")#" "$TMP/early-requests.js"
# Brotli at its best quality is too slow for a request but fine once per build.
node --import tsx -e 'require("./server/http/compressed-assets.ts").precompress(process.argv[1]).then((n) => console.log(`precompressed ${n} files`))' "$TMP" \
  || die "could not precompress the web build"
# Swap in one step so a server never serves a half-written build.
OLD="dist.old.$$"
[ -d dist ] && mv dist "$OLD"
mv "$TMP" dist
rm -rf "$OLD"

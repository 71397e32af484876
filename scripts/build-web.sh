#!/usr/bin/env bash
# Exports the Expo web app to dist/ without touching the network.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
TMP="dist.tmp.$$"
trap 'rm -rf "$TMP"' EXIT
CI=1 EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 npx expo export --platform web --output-dir "$TMP"
# Swap in one step so a server never serves a half-written build.
OLD="dist.old.$$"
[ -d dist ] && mv dist "$OLD"
mv "$TMP" dist
rm -rf "$OLD"

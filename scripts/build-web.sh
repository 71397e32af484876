#!/usr/bin/env bash
# Exports the Expo web app to dist/ without touching the network.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
rm -rf dist.tmp
CI=1 EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 npx expo export --platform web --output-dir dist.tmp
# Swap in one step so a server never serves a half-written build.
rm -rf dist.old; [ -d dist ] && mv dist dist.old; mv dist.tmp dist; rm -rf dist.old

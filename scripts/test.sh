#!/usr/bin/env bash
# npm test: every suite (unit, reference, API, browser) against a fresh test
# database, ending with one line "N passed, N failed".
set -uo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"

ensure_node_modules
ensure_apt chromium chromium
bash scripts/db-up.sh >/dev/null || die "the test database could not start"
TEST_DB="${BAYWALK_TEST_DB_NAME:-baywalk_test}"
db_root_sql "DROP DATABASE IF EXISTS \`$TEST_DB\`;" || die "could not reset $TEST_DB"
bash scripts/db-up.sh "$TEST_DB" >/dev/null || die "could not create $TEST_DB"
ensure_web_build

export NODE_ENV=test BAYWALK_DB_NAME="$TEST_DB"
mkdir -p test-artifacts
REPORT="test-artifacts/vitest-$TEST_DB.json"
rm -f "$REPORT"
npx vitest run --reporter=default --reporter=json --outputFile.json="$REPORT" "$@"
status=$?
npx tsx tests/support/summary.ts "$REPORT"
summary=$?
[ $status -eq 0 ] && [ $summary -eq 0 ] && exit 0
exit 1

#!/usr/bin/env bash
# npm test: a throwaway database on a cluster of its own, then unit, integration
# and browser tests. Ends with one line "tests: N passed, N failed".
set -uo pipefail
ROOT=$(cd "$(dirname "$0")/.." && pwd)
. "$ROOT/scripts/lib.sh"
set -e

PG_PORT=${TANKWRIGHT_TEST_PG_PORT:-54339}
APP_PORT=${TANKWRIGHT_TEST_APP_PORT:-3100}
S3_PORT=${TANKWRIGHT_TEST_S3_PORT:-4579}
MAIL_SMTP_PORT=${TANKWRIGHT_TEST_MAIL_SMTP_PORT:-1035}
MAIL_WEB_PORT=${TANKWRIGHT_TEST_MAIL_WEB_PORT:-1090}
# Runs on other ports (a second engineer on the same checkout) keep their own folders.
SUFFIX=""; [ "$PG_PORT" != 54339 ] && SUFFIX="-$PG_PORT"
PG_DATA="$ROOT/.data/postgres-test$SUFFIX"
RESULTS="$ROOT/.data/test-results$SUFFIX"
S3_DATA="$ROOT/.data/s3-test$SUFFIX"
MAIL_DATA="$ROOT/.data/mail-test$SUFFIX"
# …and their own build folder, so that two builds never write into one .next.
[ -n "$SUFFIX" ] && export TANKWRIGHT_DIST_DIR=".next-check$SUFFIX"
DIST_DIR=${TANKWRIGHT_DIST_DIR:-.next}
APP_PID=""

cleanup() {
  trap - INT TERM EXIT
  stop_bg "$APP_PID"
  stop_bg "$S3_PID"
  stop_bg "$MAIL_PID"
  wait 2>/dev/null || true
  [ -n "${PG_BIN:-}" ] && stop_cluster "$PG_DATA"
}
trap cleanup INT TERM EXIT

ensure_node_modules
ensure_chromium
# fsync off: this cluster holds only throwaway test data.
ensure_cluster "$PG_DATA" "$PG_PORT" "-c fsync=off -c synchronous_commit=off -c full_page_writes=off"
recreate_database "$PG_PORT" tankwright_test
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/tankwright_test"
export AUTH_SECRET="test-secret-for-throwaway-databases-only-0123456789"
export NEXTAUTH_SECRET="$AUTH_SECRET"
export APP_URL="http://127.0.0.1:$APP_PORT" NEXTAUTH_URL="http://127.0.0.1:$APP_PORT"
export TEST_BASE_URL="$APP_URL"
# Throwaway objects: a fresh store folder every run.
rm -rf "$S3_DATA"
start_s3_fake "$S3_DATA" "$S3_PORT" "$APP_URL"
# The tests read what the app sends from the catcher: always a fresh one, whatever SMTP_URL says.
unset SMTP_URL
rm -rf "$MAIL_DATA"
start_mail_catcher "$MAIL_DATA" "$MAIL_SMTP_PORT" "$MAIL_WEB_PORT" TANKWRIGHT_TEST_MAIL_SMTP_PORT TANKWRIGHT_TEST_MAIL_WEB_PORT
cd "$ROOT"
log "applying migrations to the test database"
npx tsx scripts/migrate.ts

rm -rf "$RESULTS"; mkdir -p "$RESULTS"
FAILED_STAGES=()
# For a developer: `npm test -- tests/e2e/photos` runs only the test files whose
# path contains one of the given filters (every stage still starts).
FILTERS=("$@")
EXTRA=()
[ ${#FILTERS[@]} -gt 0 ] && EXTRA=(--passWithNoTests "${FILTERS[@]}")
run_project() {
  log "vitest: $1 tests"
  npx vitest run --project "$1" --reporter=default --reporter=json --outputFile.json="$RESULTS/$1.json" "${EXTRA[@]}" || FAILED_STAGES+=("$1")
}

run_project unit

log "building the app for the integration and browser tests"
require_free_port "$APP_PORT"
# TANKWRIGHT_TEST_REUSE_BUILD=1 keeps an existing .next (a developer's shortcut; CI always builds).
if { [ "${TANKWRIGHT_TEST_REUSE_BUILD:-}" = 1 ] && [ -f "$DIST_DIR/BUILD_ID" ]; } || node_modules/.bin/next build >"$RESULTS/build.log" 2>&1; then
  NODE_OPTIONS="${NODE_OPTIONS:-$APP_NODE_OPTIONS}" start_bg node_modules/.bin/next start -H 127.0.0.1 -p "$APP_PORT" >"$RESULTS/app.log" 2>&1; APP_PID=$BG_PID
  if wait_for_http "$APP_URL/sign-in" 90; then
    run_project integration
    run_project e2e
  else
    tail -40 "$RESULTS/app.log"; FAILED_STAGES+=("app-start")
  fi
else
  tail -60 "$RESULTS/build.log"; FAILED_STAGES+=("build")
fi

set +e
[ ${#FAILED_STAGES[@]} -gt 0 ] && echo "failed stages: ${FAILED_STAGES[*]}"
node -e '
const fs = require("fs"), path = require("path");
let passed = 0, failed = 0, skipped = 0;
for (const f of fs.readdirSync(process.argv[1]).filter((f) => f.endsWith(".json"))) {
  const r = JSON.parse(fs.readFileSync(path.join(process.argv[1], f), "utf8"));
  passed += r.numPassedTests; failed += r.numFailedTests; skipped += r.numPendingTests + (r.numTodoTests || 0);
}
console.log(`tests: ${passed} passed, ${failed} failed` + (skipped ? `, ${skipped} skipped` : ""));
' "$RESULTS"
[ ${#FAILED_STAGES[@]} -eq 0 ]

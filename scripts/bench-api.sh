#!/usr/bin/env bash
# npm run bench:api: the API under load on a large fleet of its own. A cluster
# of its own (.data/postgres-bench, port 54349, fsync off), database
# tankwright_bench made afresh, migrations, the large fleet
# (scripts/bench-api-seed.ts), a build into .next-bench, `next start` on
# 127.0.0.1:3900 without a job worker, then scripts/bench-api-load.ts. Prints
# figures; asserts nothing. Everything it started is stopped on exit.
set -uo pipefail
ROOT=$(cd "$(dirname "$0")/.." && pwd)
. "$ROOT/scripts/lib.sh"
set -e

PG_PORT=${TANKWRIGHT_BENCH_PG_PORT:-54349}
APP_PORT=${TANKWRIGHT_BENCH_APP_PORT:-3900}
PG_DATA="$ROOT/.data/postgres-bench"
LOGS="$ROOT/.data/bench-api"
export TANKWRIGHT_DIST_DIR=.next-bench
APP_PID=""

cleanup() {
  trap - INT TERM EXIT
  stop_bg "$APP_PID"
  wait 2>/dev/null || true
  [ -n "${PG_BIN:-}" ] && stop_cluster "$PG_DATA"
  # next build adds its dist folder's type paths to tsconfig.json: put it back.
  (cd "$ROOT" && git checkout --quiet -- tsconfig.json 2>/dev/null) || true
}
trap cleanup INT TERM EXIT

cd "$ROOT"
ensure_node_modules
require_free_port "$APP_PORT" TANKWRIGHT_BENCH_APP_PORT
# fsync off: this cluster holds only throwaway benchmark data.
# auto_explain is loaded switched off (its default log_min_duration -1; not set here,
# since a command-line setting would outrank the ALTER SYSTEM that
# scripts/bench-api-load.ts uses to switch it on for a few requests after the load).
ensure_cluster "$PG_DATA" "$PG_PORT" "-c fsync=off -c synchronous_commit=off -c full_page_writes=off \
  -c shared_preload_libraries=auto_explain -c auto_explain.log_analyze=on \
  -c auto_explain.log_buffers=on -c auto_explain.log_format=json"
recreate_database "$PG_PORT" tankwright_bench
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/tankwright_bench"
export AUTH_SECRET="bench-secret-for-throwaway-databases-only-0123456789"
export NEXTAUTH_SECRET="$AUTH_SECRET"
export APP_URL="http://127.0.0.1:$APP_PORT" NEXTAUTH_URL="http://127.0.0.1:$APP_PORT"
# Settings that need no running service: nothing is uploaded or mailed during the load,
# and no job worker runs (JOBS_WORKER=false only sends).
export S3_ENDPOINT="http://127.0.0.1:9" S3_REGION=us-east-1 S3_BUCKET=tankwright-bench \
  S3_ACCESS_KEY_ID=bench S3_SECRET_ACCESS_KEY=bench S3_FORCE_PATH_STYLE=true
export SMTP_URL="smtp://127.0.0.1:9" MAIL_FROM="Tankwright bench <bench@tankwright.test>"
export JOBS_WORKER=false
rm -rf "$LOGS"; mkdir -p "$LOGS"

log "applying migrations to tankwright_bench"
npx tsx scripts/migrate.ts
log "seeding the large fleet"
npx tsx scripts/bench-api-seed.ts | tee "$LOGS/seed.log"
IDS=$(sed -n 's/^BENCH_IDS //p' "$LOGS/seed.log")
[ -n "$IDS" ] || die "the seed printed no ids"

log "building the app into $TANKWRIGHT_DIST_DIR (log: ${LOGS#$ROOT/}/build.log)"
node_modules/.bin/next build >"$LOGS/build.log" 2>&1 || { tail -60 "$LOGS/build.log"; die "next build failed"; }
git checkout --quiet -- tsconfig.json 2>/dev/null || true

log "starting the app on $APP_URL"
NODE_ENV=production NODE_OPTIONS="${NODE_OPTIONS:-$APP_NODE_OPTIONS}" start_bg node_modules/.bin/next start -H 127.0.0.1 -p "$APP_PORT" >"$LOGS/app.log" 2>&1; APP_PID=$BG_PID
wait_for_http "$APP_URL/sign-in" 90 || { tail -40 "$LOGS/app.log"; die "the app did not start"; }

BENCH_API_IDS="$IDS" BENCH_API_BASE_URL="$APP_URL" BENCH_API_PG_LOG="$PG_DATA.log" npx tsx scripts/bench-api-load.ts "$@"

#!/usr/bin/env bash
# npm start (or npm run dev with --dev): everything a laptop needs, then the app
# on http://127.0.0.1:3000. Safe to run again; Ctrl-C stops what it started.
set -euo pipefail
ROOT=$(cd "$(dirname "$0")/.." && pwd)
. "$ROOT/scripts/lib.sh"

MODE=start; [ "${1:-}" = "--dev" ] && MODE=dev
PG_PORT=${TANKWRIGHT_PG_PORT:-54329}
APP_PORT=${PORT:-3000}
PG_DATA="$ROOT/.data/postgres"
S3_PORT=${TANKWRIGHT_S3_PORT:-4569}
MAIL_SMTP_PORT=${TANKWRIGHT_MAIL_SMTP_PORT:-1025}
MAIL_WEB_PORT=${TANKWRIGHT_MAIL_WEB_PORT:-1080}
PIDS=()

cleanup() {
  trap - INT TERM EXIT
  for pid in "${PIDS[@]}"; do stop_bg "$pid"; done
  wait 2>/dev/null || true
  if [ -n "${OWN_PG:-}" ]; then log "stopping PostgreSQL"; stop_cluster "$PG_DATA"; fi
}
trap cleanup INT TERM EXIT

ensure_node_modules
if [ -z "${DATABASE_URL:-}" ]; then
  ensure_cluster "$PG_DATA" "$PG_PORT"
  OWN_PG=$PG_STARTED
  ensure_database "$PG_PORT" tankwright
  export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/tankwright"
fi
ensure_auth_secret
export APP_URL="${APP_URL:-http://127.0.0.1:$APP_PORT}" NEXTAUTH_URL="${NEXTAUTH_URL:-${APP_URL:-http://127.0.0.1:$APP_PORT}}"
start_s3_fake "$ROOT/.data/s3" "$S3_PORT" "$APP_URL,http://localhost:$APP_PORT"
[ -n "$S3_PID" ] && PIDS+=("$S3_PID")
start_mail_catcher "$ROOT/.data/mail" "$MAIL_SMTP_PORT" "$MAIL_WEB_PORT" TANKWRIGHT_MAIL_SMTP_PORT TANKWRIGHT_MAIL_WEB_PORT
[ -n "$MAIL_PID" ] && PIDS+=("$MAIL_PID")
MAIL_LINE="E-mail (reports, password resets): sent through $(smtp_url_without_password)"
[ -n "$MAIL_PID" ] && MAIL_LINE="E-mail is caught, not sent: read it at $MAILDEV_WEB_URL (SMTP ${SMTP_URL#smtp://})"

log "applying migrations"
(cd "$ROOT" && npx tsx scripts/migrate.ts)
log "seeding the demo scenario (once)"
(cd "$ROOT" && npx tsx scripts/seed.ts)

cd "$ROOT"
require_free_port "$APP_PORT"
NEXT="$ROOT/node_modules/.bin/next"
if [ "$MODE" = dev ]; then
  start_bg "$NEXT" dev -H 127.0.0.1 -p "$APP_PORT"; PIDS+=("$BG_PID")
else
  log "building the app"
  "$NEXT" build >"$ROOT/.data/build.log" 2>&1 || { tail -40 "$ROOT/.data/build.log" >&2; die "next build failed (log: .data/build.log)"; }
  NODE_OPTIONS="${NODE_OPTIONS:-$APP_NODE_OPTIONS}" start_bg "$NEXT" start -H 127.0.0.1 -p "$APP_PORT"; PIDS+=("$BG_PID")
fi
wait_for_http "http://127.0.0.1:$APP_PORT/sign-in" 120 || die "the app did not answer on port $APP_PORT"

cat <<MSG

  Tankwright is serving on $APP_URL

  Demo sign-ins (password: tankwright-demo)
    officer@tankwright.test     chief officer, MV Skerry Lantern
    master@tankwright.test      master, MV Skerry Lantern
    super@tankwright.test       technical superintendent
    surveyor@tankwright.test    class surveyor
    admin@tankwright.test       company administrator

  Photos, drawings and PDFs: ${S3_ENDPOINT:-AWS S3}, bucket $S3_BUCKET
  $MAIL_LINE
  Background jobs (photo variants, report PDFs, e-mail, clean-up) run inside the app (JOBS_WORKER).

  Ctrl-C stops the app${S3_PID:+, the local S3 store}${MAIL_PID:+, the mail catcher}${OWN_PG:+ and PostgreSQL}.

MSG
wait "${PIDS[@]}"

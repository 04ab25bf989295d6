# Shared steps of scripts/start.sh and scripts/test.sh. Source it; it expects ROOT.
# Every step is safe to repeat: it does the work only when it is missing.

# The app renders report PDFs in its job worker: a larger young generation halves
# the garbage collector's share of a render (measured by npm run bench:pdf).
APP_NODE_OPTIONS="--max-semi-space-size=64"

log() { printf '\033[1;34m[tankwright]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[tankwright] %s\033[0m\n' "$*" >&2; exit 1; }

as_root() {
  if [ "$(id -u)" = 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else
    die "needs root to run: $* (install it by hand, then run again)"; fi
}

APT_UPDATED=""
apt_install() {
  command -v apt-get >/dev/null || die "apt-get not found: install $* by hand"
  if [ -z "$APT_UPDATED" ]; then
    log "apt-get update"
    as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
    APT_UPDATED=1
  fi
  log "apt-get install $*"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

# npm ci when node_modules is missing or was installed from another lock file.
ensure_node_modules() {
  local want have=""
  want=$(sha256sum "$ROOT/package-lock.json" | cut -d' ' -f1)
  [ -f "$ROOT/node_modules/.tankwright-lock" ] && have=$(cat "$ROOT/node_modules/.tankwright-lock")
  if [ "$want" != "$have" ]; then
    log "installing dependencies (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error) || die "npm ci failed"
    echo "$want" > "$ROOT/node_modules/.tankwright-lock"
  fi
}

pg_bin() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1; }

# Runs a PostgreSQL server binary as the postgres user when we are root
# (the server refuses to run as root), as ourselves otherwise.
as_pg() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }

ensure_postgres_installed() {
  local bin; bin=$(pg_bin)
  if [ -z "$bin" ] || [ ! -x "$bin/pg_ctl" ]; then
    apt_install postgresql
    # Debian starts its own cluster on 5432; we use ours, so stop that one.
    as_root service postgresql stop >/dev/null 2>&1 || true
    bin=$(pg_bin)
  fi
  [ -x "$bin/pg_ctl" ] || die "PostgreSQL server binaries not found after install"
  PG_BIN=$bin
}

# ensure_cluster DATADIR PORT [extra server options]: initdb once, start if not running.
# Sets PG_STARTED=1 when this call started the server.
ensure_cluster() {
  local data=$1 port=$2; shift 2
  local sock="/tmp/tankwright-pg-$port"
  ensure_postgres_installed
  mkdir -p "$(dirname "$data")" "$sock"
  if [ "$(id -u)" = 0 ]; then
    id postgres >/dev/null 2>&1 || die "the postgres user is missing (reinstall the postgresql package)"
    chown postgres:postgres "$sock"
    mkdir -p "$data"; chown postgres:postgres "$data"; chmod 700 "$data"
    touch "$data.log"; chown postgres:postgres "$data.log"
    # The server must be able to reach its data folder through every parent.
    local p; p=$(dirname "$data"); while [ "$p" != / ]; do chmod o+x "$p" 2>/dev/null || true; p=$(dirname "$p"); done
  fi
  if [ ! -s "$data/PG_VERSION" ]; then
    log "creating a PostgreSQL cluster in ${data#$ROOT/}"
    as_pg "$PG_BIN/initdb" -D "$data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null || die "initdb failed"
  fi
  PG_STARTED=""
  if ! as_pg "$PG_BIN/pg_ctl" -D "$data" status >/dev/null 2>&1; then
    log "starting PostgreSQL on 127.0.0.1:$port"
    as_pg "$PG_BIN/pg_ctl" -D "$data" -l "$data.log" -w -t 60 \
      -o "-p $port -c listen_addresses=127.0.0.1 -c unix_socket_directories=$sock $*" start >/dev/null \
      || { tail -20 "$data.log" >&2; die "PostgreSQL did not start (log: $data.log)"; }
    PG_STARTED=1
  fi
}

stop_cluster() { as_pg "$PG_BIN/pg_ctl" -D "$1" -m fast -w stop >/dev/null 2>&1 || true; }

# psql_admin PORT SQL
psql_admin() { "$PG_BIN/psql" -X -q -v ON_ERROR_STOP=1 -h 127.0.0.1 -p "$1" -U postgres -d postgres -tAc "$2"; }

ensure_database() {
  local port=$1 name=$2
  if [ "$(psql_admin "$port" "select 1 from pg_database where datname = '$name'")" != 1 ]; then
    log "creating database $name"
    psql_admin "$port" "create database \"$name\""
  fi
}

recreate_database() {
  local port=$1 name=$2
  psql_admin "$port" "drop database if exists \"$name\" with (force)"
  psql_admin "$port" "create database \"$name\""
}

# A random secret kept in an ignored file, so that sessions survive restarts on a laptop.
ensure_auth_secret() {
  local file="$ROOT/.data/auth-secret"
  if [ -z "${AUTH_SECRET:-}" ]; then
    mkdir -p "$ROOT/.data"
    [ -s "$file" ] || node -e 'process.stdout.write(require("crypto").randomBytes(32).toString("base64url"))' > "$file"
    AUTH_SECRET=$(cat "$file")
  fi
  export AUTH_SECRET NEXTAUTH_SECRET="$AUTH_SECRET"
}

ensure_chromium() {
  [ -x /usr/bin/chromium ] || apt_install chromium
  [ -x /usr/bin/chromium ] || die "Chromium not found at /usr/bin/chromium"
}

# wait_for_http URL SECONDS
wait_for_http() {
  local url=$1 deadline=$((SECONDS + $2))
  until node -e 'fetch(process.argv[1],{redirect:"manual"}).then(r=>process.exit(r.status<500?0:1),()=>process.exit(1))' "$url"; do
    [ $SECONDS -lt $deadline ] || return 1
    sleep 0.3
  done
}

# require_free_port PORT [VARIABLE]: fails when something already answers on the port
# (an old server would hide ours); the message names the variable that moves it.
require_free_port() {
  if node -e 'const s=require("net").connect(+process.argv[1],"127.0.0.1");s.on("connect",()=>process.exit(0));s.on("error",()=>process.exit(1))' "$1"; then
    die "port $1 is already in use; stop what is running there (or set ${2:-PORT}) and try again"
  fi
}

# start_bg: runs a command in its own process group, so that stop_bg ends it with all its children.
start_bg() { setsid "$@" & BG_PID=$!; }
stop_bg() { [ -n "${1:-}" ] && kill -TERM -- "-$1" 2>/dev/null || true; }

# start_s3_fake DIR PORT ORIGINS: the local S3-compatible store (docker-free-minio-fake/),
# unless S3_BUCKET points at a real one. Exports the S3_* settings the app reads; sets S3_PID.
S3_PID=""
start_s3_fake() {
  local dir=$1 port=$2 origins=$3
  if [ -n "${S3_BUCKET:-}" ]; then log "using the object storage in S3_BUCKET ($S3_BUCKET)"; return; fi
  require_free_port "$port"
  mkdir -p "$dir"
  log "starting the local S3 store on 127.0.0.1:$port (files in ${dir#$ROOT/})"
  S3_FAKE_DIR="$dir" S3_FAKE_PORT="$port" S3_BUCKET=tankwright S3_FAKE_CORS_ORIGINS="$origins" \
    start_bg node "$ROOT/docker-free-minio-fake/server.mjs"
  S3_PID=$BG_PID
  export S3_ENDPOINT="http://127.0.0.1:$port" S3_REGION=us-east-1 S3_BUCKET=tankwright \
    S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER S3_FORCE_PATH_STYLE=true
  local deadline=$((SECONDS + 30))
  until node -e 'const s=require("net").connect(+process.argv[1],"127.0.0.1");s.on("connect",()=>process.exit(0));s.on("error",()=>process.exit(1))' "$port"; do
    [ $SECONDS -lt $deadline ] || die "the local S3 store did not start on port $port"
    sleep 0.2
  done
}

# start_mail_catcher DIR SMTP_PORT WEB_PORT [SMTP_PORT_VARIABLE WEB_PORT_VARIABLE]: the local
# mail catcher (maildev), unless SMTP_URL points at a real service. Both ports bound to
# 127.0.0.1 only; messages are kept in DIR (its own per catcher: clearing one must not
# empty another). Exports SMTP_URL and MAILDEV_WEB_URL; sets MAIL_PID.
MAIL_PID=""
smtp_url_without_password() { printf '%s' "${SMTP_URL:-}" | sed -E 's#//[^@/]*@#//#'; }
start_mail_catcher() {
  local dir=$1 smtp_port=$2 web_port=$3
  if [ -n "${SMTP_URL:-}" ]; then log "sending e-mail through SMTP_URL ($(smtp_url_without_password))"; return; fi
  require_free_port "$smtp_port" "${4:-the mail catcher's SMTP port}"
  require_free_port "$web_port" "${5:-the mail catcher's web port}"
  mkdir -p "$dir"
  log "starting the local mail catcher: SMTP 127.0.0.1:$smtp_port, web http://127.0.0.1:$web_port"
  start_bg "$ROOT/node_modules/.bin/maildev" --ip 127.0.0.1 --web-ip 127.0.0.1 \
    --smtp "$smtp_port" --web "$web_port" --mail-directory "$dir" --silent
  MAIL_PID=$BG_PID
  export SMTP_URL="smtp://127.0.0.1:$smtp_port" MAILDEV_WEB_URL="http://127.0.0.1:$web_port"
  local deadline=$((SECONDS + 30))
  until node -e 'fetch(process.argv[1]).then(r=>process.exit(r.ok?0:1),()=>process.exit(1))' "$MAILDEV_WEB_URL/api/healthz" \
    && node -e 'const s=require("net").connect(+process.argv[1],"127.0.0.1");s.on("connect",()=>process.exit(0));s.on("error",()=>process.exit(1))' "$smtp_port"; do
    [ $SECONDS -lt $deadline ] || die "the local mail catcher did not start on ports $smtp_port / $web_port"
    sleep 0.2
  done
}

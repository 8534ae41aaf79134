# Shared by scripts/start.sh, scripts/test.sh and scripts/resilience.sh. Sourced, not run.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1
export PATH="$ROOT/node_modules/.bin:$PATH"

log() { printf '\033[1;33m[hubface]\033[0m %s\n' "$*"; }

as_root() { if [ "$(id -u)" = 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else "$@"; fi; }

apt_install() {
  log "installing Debian packages: $*"
  if [ ! -f /tmp/.hubface-apt-updated ]; then as_root apt-get update -qq && touch /tmp/.hubface-apt-updated; fi
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq "$@" >/dev/null
}

ensure_node_modules() {
  local stamp="node_modules/.hubface-lock"
  if [ ! -d node_modules ] || [ ! -f "$stamp" ] || ! cmp -s package-lock.json "$stamp"; then
    log "installing npm packages (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error
    cp package-lock.json "$stamp"
  fi
}

pg_bin() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1; }

ensure_postgres() {
  if [ -z "$(pg_bin)" ] || [ ! -x "$(pg_bin)/initdb" ]; then apt_install postgresql; fi
  PGBIN="$(pg_bin)"
}

ensure_chromium() {
  if ! command -v chromium >/dev/null 2>&1; then apt_install chromium; fi
}

# pg_up DATA_DIR PORT DBNAME [extra postgres options]: a project-local cluster on 127.0.0.1.
pg_up() {
  local dir port="$2" dbname="$3" extra="${4:-}"
  dir="$(realpath -m "$1")"
  ensure_postgres
  local runas=()
  if [ "$(id -u)" = 0 ]; then runas=(runuser -u postgres --); fi
  if [ ! -f "$dir/PG_VERSION" ]; then
    log "creating PostgreSQL cluster in $dir"
    mkdir -p "$dir"
    if [ "$(id -u)" = 0 ]; then
      # initdb refuses root: the cluster belongs to the postgres user, who must reach the folder.
      local p="$dir"; while [ "$p" != "/" ]; do p="$(dirname "$p")"; chmod o+x "$p" 2>/dev/null || true; done
      chown postgres:postgres "$dir"
    fi
    chmod 700 "$dir"
    "${runas[@]}" "$PGBIN/initdb" -D "$dir" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if "$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$port" && [ ! -f "$dir/postmaster.pid" ]; then
    log "port $port already has a PostgreSQL that is not $dir's: stop it or pick another port"; return 1
  fi
  if ! "$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$port"; then
    "${runas[@]}" "$PGBIN/pg_ctl" -D "$dir" -l "$dir/server.log" -w -t 30 \
      -o "-c listen_addresses=127.0.0.1 -p $port -k '' $extra" start >/dev/null
  fi
  if ! "$PGBIN/psql" -h 127.0.0.1 -p "$port" -U postgres -tAc "select 1 from pg_database where datname='$dbname'" | grep -q 1; then
    "$PGBIN/createdb" -h 127.0.0.1 -p "$port" -U postgres "$dbname"
  fi
}

pg_down() {
  local dir="$1"
  [ -f "$dir/postmaster.pid" ] || return 0
  local runas=()
  if [ "$(id -u)" = 0 ]; then runas=(runuser -u postgres --); fi
  "${runas[@]}" "$PGBIN/pg_ctl" -D "$dir" -m fast -w stop >/dev/null 2>&1 || true
}

# Development secrets are made on this machine on first start and never committed.
ensure_env_file() {
  if [ ! -f .env.local ] || ! grep -q '^NEXTAUTH_SECRET=' .env.local; then
    log "generating development secrets in .env.local"
    echo "NEXTAUTH_SECRET=$(node -e 'console.log(require("crypto").randomBytes(32).toString("base64url"))')" >> .env.local
  fi
  if ! grep -q '^STRIPE_WEBHOOK_SECRET=' .env.local; then
    echo "STRIPE_WEBHOOK_SECRET=whsec_$(node -e 'console.log(require("crypto").randomBytes(24).toString("hex"))')" >> .env.local
  fi
  set -a; . ./.env.local; set +a
}

wait_for_http() {
  local url="$1" tries="${2:-120}"
  for _ in $(seq "$tries"); do
    if node -e "fetch('$url').then(r=>process.exit(r.status<500||r.status===503?0:1)).catch(()=>process.exit(1))" 2>/dev/null; then return 0; fi
    sleep 0.5
  done
  return 1
}

random_hex() { node -e "console.log(require('crypto').randomBytes($1).toString('hex'))"; }

# stop_on_exit DATA_DIR: when the script ends or is interrupted, stop every background process it
# recorded (`cmd & PIDS+=($!)`), then the throw-away PostgreSQL cluster in DATA_DIR.
PIDS=()
stop_on_exit() {
  STOP_PGDATA="$1"
  trap stop_everything EXIT INT TERM
}
stop_everything() {
  trap - EXIT INT TERM
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null; done
  for pid in "${PIDS[@]}"; do wait "$pid" 2>/dev/null; done
  pg_down "$STOP_PGDATA"
}

# fresh_database PORT NAME...: each database dropped (its connections closed) and created empty;
# fails when any of them could not be.
fresh_database() {
  local port="$1" name failed=0; shift
  for name in "$@"; do
    "$PGBIN/psql" -q -h 127.0.0.1 -p "$port" -U postgres -d postgres \
      -c "drop database if exists $name with (force)" -c "create database $name" >/dev/null || failed=1
  done
  return "$failed"
}

# fake_mail_and_pay_env APP_URL SMTP_PORT OUTBOX_PORT PAY_PORT STRIPE_KEY: the app at APP_URL sends
# mail to the local fake SMTP server and pays through the local fake provider (scripts/services),
# with a webhook secret made for this run.
fake_mail_and_pay_env() {
  local app="$1" smtp="$2" outbox="$3" pay="$4"
  export NEXTAUTH_URL="$app" APP_ORIGIN="$app"
  export SMTP_PORT="$smtp" OUTBOX_PORT="$outbox" SMTP_URL="smtp://127.0.0.1:$smtp" OUTBOX_URL="http://127.0.0.1:$outbox"
  export FAKE_PAY_PORT="$pay" STRIPE_SECRET_KEY="$5" STRIPE_API_HOST=127.0.0.1 STRIPE_API_PORT="$pay"
  STRIPE_WEBHOOK_SECRET="whsec_$(random_hex 24)"
  export STRIPE_WEBHOOK_SECRET STRIPE_WEBHOOK_URL="$app/api/payments/webhook"
}

# fake_photo_store_env S3_PORT S3_DIR: photos go to the local S3 fake (scripts/services/fake-s3.ts).
fake_photo_store_env() {
  export S3_PORT="$1" S3_DIR="$2" S3_BUCKET=hubface-photos S3_REGION=us-east-1
  export S3_ENDPOINT="http://127.0.0.1:$1" S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER
}

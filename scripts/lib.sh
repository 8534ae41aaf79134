# Shared by scripts/start.sh and scripts/test.sh. Sourced, not run.
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

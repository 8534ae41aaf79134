#!/usr/bin/env bash
# One command: install what is missing, start PostgreSQL, the local mail server and the app with
# demo data at http://127.0.0.1:3000. Ctrl-C stops everything cleanly.
source "$(dirname "$0")/lib.sh"

PORT="${PORT:-3000}"
PGDATA_DIR="$ROOT/.data/pg-demo"
PGPORT_DEMO="${HUBFACE_PG_PORT:-55432}"
PIDS=()

cleanup() {
  trap - EXIT INT TERM
  log "stopping"
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  for pid in "${PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  if [ -z "${EXTERNAL_DB:-}" ]; then pg_down "$PGDATA_DIR"; log "PostgreSQL stopped"; fi
}
trap cleanup EXIT INT TERM

ensure_node_modules
ensure_env_file

if [ -n "${DATABASE_URL:-}" ]; then
  EXTERNAL_DB=1
  log "using DATABASE_URL from the environment"
else
  pg_up "$PGDATA_DIR" "$PGPORT_DEMO" hubface
  export DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT_DEMO/hubface"
fi

export NEXTAUTH_URL="${NEXTAUTH_URL:-http://127.0.0.1:$PORT}"
export APP_ORIGIN="${APP_ORIGIN:-$NEXTAUTH_URL}"
export SMTP_PORT="${SMTP_PORT:-2525}" OUTBOX_PORT="${OUTBOX_PORT:-2526}"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:$SMTP_PORT}"
export OUTBOX_URL="${OUTBOX_URL:-http://127.0.0.1:$OUTBOX_PORT}"
export OUTBOX_FILE="$ROOT/.data/outbox.json"
# The payment SDK talks to the local fake provider (scripts/services/fake-pay.ts); the key is a test value.
export FAKE_PAY_PORT="${FAKE_PAY_PORT:-2527}"
export STRIPE_SECRET_KEY="${STRIPE_SECRET_KEY:-sk_test_hubface_local}"
export STRIPE_API_HOST="${STRIPE_API_HOST:-127.0.0.1}" STRIPE_API_PORT="${STRIPE_API_PORT:-$FAKE_PAY_PORT}"
export STRIPE_WEBHOOK_URL="${STRIPE_WEBHOOK_URL:-http://127.0.0.1:$PORT/api/payments/webhook}"
mkdir -p .data

# Photo storage: a local S3-compatible fake (bucket created at start) unless S3_ENDPOINT is set.
export S3_BUCKET="${S3_BUCKET:-hubface-photos}" S3_REGION="${S3_REGION:-us-east-1}"
export S3_ACCESS_KEY_ID="${S3_ACCESS_KEY_ID:-S3RVER}" S3_SECRET_ACCESS_KEY="${S3_SECRET_ACCESS_KEY:-S3RVER}"
if [ -z "${S3_ENDPOINT:-}" ]; then
  export S3_PORT="${HUBFACE_S3_PORT:-4568}" S3_DIR="$ROOT/.data/s3-demo"
  export S3_ENDPOINT="http://127.0.0.1:$S3_PORT"
  tsx scripts/services/fake-s3.ts & PIDS+=($!)
  wait_for_http "$S3_ENDPOINT/" || { log "the photo store did not start"; exit 1; }
fi

log "migrating the database"
npm run -s db:migrate >/dev/null
log "loading demo data (kept when already there)"
npm run -s db:seed >/dev/null

tsx scripts/services/fake-smtp.ts & PIDS+=($!)
tsx scripts/services/fake-pay.ts & PIDS+=($!)

if [ ! -f .next/BUILD_ID ] || [ -n "$(find app components lib proxy.ts next.config.mjs tailwind.config.ts package-lock.json -newer .next/BUILD_ID -print -quit 2>/dev/null)" ]; then
  log "building the app (next build)"
  next build >/dev/null
fi

tsx scripts/serve.ts --hostname 127.0.0.1 --port "$PORT" & PIDS+=($!)
wait_for_http "http://127.0.0.1:$PORT/api/health" || { log "the app did not start"; exit 1; }

cat <<INFO

  Hubface is running at http://127.0.0.1:$PORT   (Ctrl-C stops it and PostgreSQL)

  Demo accounts (password for all: hubface-demo-1)
    member       juno@demo.hubface.test      an enthusiast with a saved garage
    shop_staff   teo@demo.hubface.test       counter staff at Quarry Flats Tire & Fab
    shop_owner   mara@demo.hubface.test      owner of Quarry Flats Tire & Fab
    admin        admin@demo.hubface.test     sees users and the development outbox

  Mail sent by the app lands in the outbox: sign in as admin → Outbox (/admin/outbox)
  Deposits are paid on a local fake payment page (test card 4242 4242 4242 4242).

INFO
wait -n "${PIDS[@]}" || true

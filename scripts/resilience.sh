#!/usr/bin/env bash
# `npm run test:resilience`: the load-and-fault suite (scripts/resilience.mts), NOT part of
# `npm test`. It brings up everything it needs on its own ports and throws it away after:
# a PostgreSQL cluster in .data/resilience/pg (port 55470), the demo seed, the local fake
# photo store / mail / payment services and the production server(s) on 3700 and 3701.
# Needs a `next build`; made here when .next has none (RESILIENCE_BUILD=1 forces a new one).
# Run time about 100–125 s on a 2-core machine after the build (README "Resilience").
source "$(dirname "$0")/lib.sh"
set +e

RS="$ROOT/.data/resilience"
export RS_PGDATA="$RS/pg"
export RS_PGPORT="${HUBFACE_RS_PG_PORT:-55470}"
export RS_PORT_A="${HUBFACE_RS_PORT_A:-3700}" RS_PORT_B="${HUBFACE_RS_PORT_B:-3701}"
RS_S3="${HUBFACE_RS_S3_PORT:-3710}" RS_SMTP="${HUBFACE_RS_SMTP_PORT:-3711}" RS_OUTBOX="${HUBFACE_RS_OUTBOX_PORT:-3712}" RS_PAY="${HUBFACE_RS_PAY_PORT:-3713}"
export RS_LOGS="$RS/logs"
PIDS=()

cleanup() {
  trap - EXIT INT TERM
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null; done
  for pid in "${PIDS[@]}"; do wait "$pid" 2>/dev/null; done
  pg_down "$RS_PGDATA"
}
trap cleanup EXIT INT TERM

fail() { log "resilience suite could not run: $*"; exit 1; }

[ -d node_modules ] || fail "node_modules is missing (npm ci first)"
ensure_postgres
export PGBIN
mkdir -p "$RS"
SETUP_STARTED_AT="$(date +%s%3N)"
rm -rf "$RS_LOGS" "$RS/s3"; mkdir -p "$RS_LOGS"

# A throw-away cluster with the durability settings a real one keeps (fsync on): lost writes
# are what this suite looks for.
pg_up "$RS_PGDATA" "$RS_PGPORT" postgres || fail "PostgreSQL did not start"
"$PGBIN/psql" -q -h 127.0.0.1 -p "$RS_PGPORT" -U postgres -d postgres \
  -c "drop database if exists hubface_resilience with (force)" -c "create database hubface_resilience" >/dev/null || fail "could not create the database"

export DATABASE_URL="postgres://postgres@127.0.0.1:$RS_PGPORT/hubface_resilience"
export NEXTAUTH_SECRET="resilience-$(node -e 'console.log(require("crypto").randomBytes(16).toString("hex"))')"
# One public origin for both servers, as behind one load balancer.
export NEXTAUTH_URL="http://127.0.0.1:$RS_PORT_A" APP_ORIGIN="http://127.0.0.1:$RS_PORT_A"
export SMTP_PORT="$RS_SMTP" OUTBOX_PORT="$RS_OUTBOX" SMTP_URL="smtp://127.0.0.1:$RS_SMTP" OUTBOX_URL="http://127.0.0.1:$RS_OUTBOX"
export FAKE_PAY_PORT="$RS_PAY" STRIPE_SECRET_KEY="sk_test_hubface_resilience" STRIPE_API_HOST=127.0.0.1 STRIPE_API_PORT="$RS_PAY"
export STRIPE_WEBHOOK_SECRET="whsec_$(node -e 'console.log(require("crypto").randomBytes(24).toString("hex"))')"
export STRIPE_WEBHOOK_URL="$NEXTAUTH_URL/api/payments/webhook"
export S3_PORT="$RS_S3" S3_DIR="$RS/s3" S3_BUCKET=hubface-photos S3_REGION=us-east-1
export S3_ENDPOINT="http://127.0.0.1:$RS_S3" S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER

# The build reads DATABASE_URL (configuration only; nothing is queried).
if [ ! -f .next/BUILD_ID ] || [ "${RESILIENCE_BUILD:-}" = 1 ]; then
  log "building the app (next build)"
  BUILD_STARTED_AT="$(date +%s%3N)"
  next build > "$RS/next-build.log" 2>&1 || fail "next build failed; see $RS/next-build.log"
  # The run time printed leaves the build out.
  SETUP_STARTED_AT=$((SETUP_STARTED_AT + $(date +%s%3N) - BUILD_STARTED_AT))
fi

tsx scripts/services/fake-s3.ts > "$RS_LOGS/fake-s3.log" 2>&1 & PIDS+=($!)
tsx scripts/services/fake-smtp.ts > "$RS_LOGS/fake-smtp.log" 2>&1 & PIDS+=($!)
tsx scripts/services/fake-pay.ts > "$RS_LOGS/fake-pay.log" 2>&1 & PIDS+=($!)
wait_for_http "$S3_ENDPOINT/" 40 || fail "the photo store did not start; see $RS_LOGS/fake-s3.log"
npm run -s db:migrate > "$RS_LOGS/migrate.log" 2>&1 || fail "migrations failed; see $RS_LOGS/migrate.log"
npm run -s db:seed > "$RS_LOGS/seed.log" 2>&1 || fail "the demo seed failed; see $RS_LOGS/seed.log"

export RS_STARTED_AT="$SETUP_STARTED_AT"
tsx scripts/resilience.mts

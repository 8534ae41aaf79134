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
stop_on_exit "$RS_PGDATA"

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
fresh_database "$RS_PGPORT" hubface_resilience || fail "could not create the database"

export DATABASE_URL="postgres://postgres@127.0.0.1:$RS_PGPORT/hubface_resilience"
export NEXTAUTH_SECRET="resilience-$(random_hex 16)"
# One public origin for both servers, as behind one load balancer.
fake_mail_and_pay_env "http://127.0.0.1:$RS_PORT_A" "$RS_SMTP" "$RS_OUTBOX" "$RS_PAY" sk_test_hubface_resilience
fake_photo_store_env "$RS_S3" "$RS/s3"

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

#!/usr/bin/env bash
# One command: install what is missing and run every test suite — lint, types, unit and
# integration (Vitest against a throw-away PostgreSQL), then browser tests in Chromium against
# `next start`. Ends with one line "N passed, N failed" summing every suite.
source "$(dirname "$0")/lib.sh"
set +e

RESULTS="$ROOT/.data/test-results"
PGDATA_DIR="$ROOT/.data/pg-test"
PGPORT_TEST="${HUBFACE_TEST_PG_PORT:-55433}"
APP_PORT="${HUBFACE_TEST_APP_PORT:-3100}"
T_SMTP="${HUBFACE_TEST_SMTP_PORT:-2625}"
T_OUTBOX="${HUBFACE_TEST_OUTBOX_PORT:-2626}"
T_PAY="${HUBFACE_TEST_PAY_PORT:-2627}"
T_S3="${HUBFACE_TEST_S3_PORT:-4569}"
stop_on_exit "$PGDATA_DIR"

set -e
ensure_node_modules
ensure_postgres
ensure_chromium
set +e
rm -rf "$RESULTS"; mkdir -p "$RESULTS"

record() { # record NAME PASSED FAILED
  echo "{\"suite\":\"$1\",\"passed\":$2,\"failed\":$3}" > "$RESULTS/$1.count.json"
}
check() { # check NAME command...: a whole command counted as one test
  local name="$1"; shift
  log "$name"
  if "$@"; then record "$name" 1 0; else record "$name" 0 1; fi
}

# A throw-away cluster: fsync off is fine here, never for data anyone keeps.
pg_up "$PGDATA_DIR" "$PGPORT_TEST" postgres "-c fsync=off -c synchronous_commit=off -c full_page_writes=off" || { record postgres 0 1; node scripts/sum-results.mjs "$RESULTS"; exit 1; }
fresh_database "$PGPORT_TEST" hubface_test hubface_e2e
export PGHOST=127.0.0.1 PGPORT_TEST
export TEST_DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT_TEST/hubface_test"
export E2E_DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT_TEST/hubface_e2e"
export NEXTAUTH_SECRET="test-secret-$(random_hex 16)"

# The four static checks in two chains side by side (each check is single-threaded; the machine
# has two cores). Each chain's output goes to a file, printed once the chain is done.
chain() { # chain a|b: runs checks_a or checks_b, its output to a file
  "checks_$1" > "$RESULTS/checks-$1.log" 2>&1
}
checks_a() {
  check lint eslint . --max-warnings=0
  # Dead exports (knip will replace this script once package changes are free).
  check exports tsx scripts/check-exports.mts
}
checks_b() {
  check typecheck tsc --noEmit
  check format prettier --check . --log-level warn
}
chain a & chain_a=$!
chain b & chain_b=$!
wait "$chain_a" "$chain_b"
cat "$RESULTS/checks-a.log" "$RESULTS/checks-b.log"

log "unit and integration tests (Vitest)"
# Integration files run side by side, each worker on a database of its own
# (tests/integration/support/workerDatabase.ts makes them beside hubface_test).
DATABASE_URL="$TEST_DATABASE_URL" vitest run --project unit --project integration \
  --reporter=default --reporter=json --outputFile.json="$RESULTS/vitest.json"

log "building the app for browser tests"
export DATABASE_URL="$E2E_DATABASE_URL"
export E2E_BASE_URL="http://127.0.0.1:$APP_PORT"
fake_mail_and_pay_env "$E2E_BASE_URL" "$T_SMTP" "$T_OUTBOX" "$T_PAY" sk_test_hubface_e2e
export PG_TEST_DATA_DIR="$PGDATA_DIR" PGBIN
# Types were checked above; the build skips its own type pass and cache (next.config.mjs).
if HUBFACE_TEST_BUILD=1 next build > "$RESULTS/next-build.log" 2>&1; then
  record build 1 0
  fake_photo_store_env "$T_S3" "$ROOT/.data/s3-test"
  export S3_RESET=1
  rm -rf "$S3_DIR"
  tsx scripts/services/fake-s3.ts > "$RESULTS/fake-s3.log" 2>&1 & PIDS+=($!)
  wait_for_http "$S3_ENDPOINT/" 20 || log "the photo store did not start; see $RESULTS/fake-s3.log"
  npm run -s db:migrate >/dev/null && npm run -s db:seed >/dev/null
  tsx scripts/services/fake-smtp.ts > "$RESULTS/fake-smtp.log" 2>&1 & PIDS+=($!)
  tsx scripts/services/fake-pay.ts > "$RESULTS/fake-pay.log" 2>&1 & PIDS+=($!)
  tsx scripts/serve.ts --hostname 127.0.0.1 --port "$APP_PORT" > "$RESULTS/next-start.log" 2>&1 & PIDS+=($!)
  if wait_for_http "$E2E_BASE_URL/api/health"; then
    log "browser and HTTP tests (Chromium)"
    vitest run --project browser --project browser-alone --reporter=default --reporter=json --outputFile.json="$RESULTS/vitest-browser.json"
  else
    log "the app did not start; see $RESULTS/next-start.log"; record browser-start 0 1
  fi
else
  cat "$RESULTS/next-build.log"; record build 0 1
fi

node scripts/sum-results.mjs "$RESULTS"

#!/usr/bin/env bash
# Runs Rampline's whole test suite the way CI does: same set-up as scripts/start.sh against a separate test
# database, then the type check, the linter, unit tests, integration tests against the real PostgreSQL, and browser
# tests against a production build. Ends with one line "N passed, N failed"; exits non-zero on any failure.
set -uo pipefail
source "$(dirname "$0")/lib/setup.sh"
source "$(dirname "$0")/lib/app-env.sh"
set -e

CHILD_PIDS=()
cleanup() {
  trap - INT TERM EXIT
  for pid in "${CHILD_PIDS[@]}"; do kill_tree "$pid"; done
  for pid in "${CHILD_PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  stop_cluster_if_started_here
}
trap cleanup INT TERM EXIT

common_setup
ensure_chromium
export_app_env rampline_test "${RAMPLINE_TEST_PORT:-3100}" "${RAMPLINE_TEST_MAIL_PORT:-3125}" \
  "$DATA_DIR/test-mail-fake.json" .next-test
# Quick retries so the tests that stop the mail fake do not wait long; the production default is 30 s.
export MAIL_RETRY_DELAY_SECONDS=1
cd "$ROOT"

RESULTS="$DATA_DIR/test-results"
rm -rf "$RESULTS" && mkdir -p "$RESULTS"
set +e

# A check that is not a Vitest run (type check, lint, build) counts as one test.
check() {
  local name="$1"; shift
  log "Running: $name"
  if "$@"; then echo '{"passed":1,"failed":0}' > "$RESULTS/$name.check.json"
  else echo '{"passed":0,"failed":1}' > "$RESULTS/$name.check.json"; log "FAILED: $name"; fi
}

vitest_project() {
  local project="$1"
  log "Running: vitest $project"
  npx vitest run --project "$project" --reporter=default --reporter=json \
    --outputFile.json="$RESULTS/$project.vitest.json" || log "FAILED: vitest $project"
  [ -f "$RESULTS/$project.vitest.json" ] || echo '{"numPassedTests":0,"numFailedTests":1}' > "$RESULTS/$project.vitest.json"
}

check database npm run -s db:migrate -- --recreate
check seed npm run -s db:seed
check typecheck npx tsc --noEmit -p tsconfig.check.json
check lint npx eslint --max-warnings 0 .
vitest_project unit
vitest_project integration

rm -f "$MAIL_FAKE_STORE"
check build env NODE_ENV=production npx next build
if [ -f "$RESULTS/build.check.json" ] && grep -q '"passed":1' "$RESULTS/build.check.json"; then
  npx tsx fakes/mail/server.ts > "$DATA_DIR/test-mail-fake.log" 2>&1 &
  CHILD_PIDS+=($!)
  NODE_ENV=production npx next start --hostname 127.0.0.1 --port "$APP_PORT" > "$DATA_DIR/test-server.log" 2>&1 &
  CHILD_PIDS+=($!)
  if wait_for_url "$RESEND_BASE_URL/health" 30 && wait_for_url "$APP_URL/api/health" 60; then
    vitest_project e2e
  else
    log "FAILED: the test server did not start (see $DATA_DIR/test-server.log)"
    echo '{"numPassedTests":0,"numFailedTests":1}' > "$RESULTS/e2e.vitest.json"
  fi
fi

node scripts/lib/summarise-results.mjs "$RESULTS"

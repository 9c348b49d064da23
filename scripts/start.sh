#!/usr/bin/env bash
# Starts Rampline with its demo data on http://127.0.0.1:3000. Installs what is missing, runs PostgreSQL on
# loopback, migrates, seeds (idempotently), starts the local mail fake, builds and serves. Ctrl-C stops it all.
set -euo pipefail
source "$(dirname "$0")/lib/setup.sh"
source "$(dirname "$0")/lib/app-env.sh"

CHILD_PIDS=()
cleanup() {
  trap - INT TERM EXIT
  for pid in "${CHILD_PIDS[@]}"; do kill_tree "$pid"; done
  for pid in "${CHILD_PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  stop_cluster_if_started_here
  log "Stopped."
}
trap cleanup INT TERM EXIT

common_setup
export_app_env rampline "${RAMPLINE_PORT:-3000}" "${RAMPLINE_MAIL_PORT:-3025}" "$DATA_DIR/mail-fake.json" .next
cd "$ROOT"

npm run -s db:migrate -- --create
npm run -s db:seed

log "Starting the local mail fake on $RESEND_BASE_URL…"
npx tsx fakes/mail/server.ts > "$DATA_DIR/mail-fake.log" 2>&1 &
CHILD_PIDS+=($!)
wait_for_url "$RESEND_BASE_URL/health" 30 || fail "The mail fake did not start; see $DATA_DIR/mail-fake.log"

log "Building Rampline (next build)…"
NODE_ENV=production npx next build > "$DATA_DIR/build.log" 2>&1 || { tail -n 40 "$DATA_DIR/build.log"; fail "The build failed; see $DATA_DIR/build.log"; }

log "Serving Rampline…"
NODE_ENV=production npx next start --hostname 127.0.0.1 --port "$APP_PORT" &
CHILD_PIDS+=($!)
wait_for_url "$APP_URL/api/health" 60 || fail "Rampline did not start."

npx tsx scripts/print-sign-ins.ts "$APP_URL" "$RESEND_BASE_URL"
wait -n "${CHILD_PIDS[@]}"

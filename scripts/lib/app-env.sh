#!/usr/bin/env bash
# Exports the environment the app, the migrate and seed scripts and the mail fake share. Sourced after setup.sh.
# Arguments: database name, app port, mail-fake port, mail-fake store file, Next build folder.
export_app_env() {
  local database="$1" app_port="$2" mail_port="$3" mail_store="$4" dist_dir="$5"
  export DATABASE_URL; DATABASE_URL="$(database_url "$database")"
  export APP_URL="http://127.0.0.1:$app_port"
  export APP_PORT="$app_port"
  export BETTER_AUTH_URL="$APP_URL"
  export BETTER_AUTH_SECRET RESEND_API_KEY
  export RESEND_BASE_URL="http://127.0.0.1:$mail_port"
  export MAIL_FAKE_PORT="$mail_port"
  export MAIL_FAKE_HOST="127.0.0.1"
  export MAIL_FAKE_API_KEY="$RESEND_API_KEY"
  export MAIL_FAKE_STORE="$mail_store"
  export NEXT_DIST_DIR="$dist_dir"
  export STORAGE_DIR="$DATA_DIR/uploads-$database"
  export NEXT_TELEMETRY_DISABLED=1
}

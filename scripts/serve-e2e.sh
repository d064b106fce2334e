#!/usr/bin/env bash
# Started by Playwright: a fresh e2e database with demo data, a fake SMTP server, and the built app on
# E2E_PORT (default 3100; the SMTP sink listens 1000 above it and its mail page 1001 above, the fake S3 server 1500 above).
# With E2E_EMPTY=1 the database is migrated but gets no demo data (tests/e2e/support-empty-server.ts starts it so).
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
PORT="${E2E_PORT:-3100}"
SMTP="$((PORT + 1000))"
S3="$((PORT + 1500))"

# Playwright ends this script with SIGTERM to its process group (playwright.config.ts gracefulShutdown): the app
# gets it too; the sinks run in sessions of their own (setsid), so they are stopped here. The app runs in the
# background so that the signal interrupts `wait` at once rather than after the app has finished.
app=""
stop_all() {
  if [ -n "$app" ]; then kill "$app" 2>/dev/null || true; wait "$app" 2>/dev/null || true; fi
  bash scripts/mail-sink.sh stop "$SMTP"
  bash scripts/s3-sink.sh stop "$S3"
}
trap stop_all EXIT
trap 'exit 143' TERM
trap 'exit 130' INT

bash scripts/db.sh up >/dev/null
bash scripts/db.sh create "loopwright_e2e_$PORT"
export DATABASE_URL="$(db_url "loopwright_e2e_$PORT")"
export NEXTAUTH_URL="http://localhost:$PORT"
export NEXTAUTH_SECRET="$(cat "$DATA_DIR/session-secret")"
export SMTP_PORT="$SMTP"
npx tsx scripts/migrate.ts
if [ "${E2E_EMPTY:-}" != 1 ]; then
  # a second organisation, for the cross-organisation checks of tests/e2e/api-*.spec.ts
  LOOPWRIGHT_SEED_RIVAL=1 npx tsx scripts/seed.ts
fi
bash scripts/mail-sink.sh stop "$SMTP"
bash scripts/mail-sink.sh start "$SMTP" "$DATABASE_URL"
export_s3_env "$S3"
bash scripts/s3-sink.sh stop "$S3"
rm -rf "$DATA_DIR/s3-$S3"
bash scripts/s3-sink.sh start "$S3"

npx next start --hostname 127.0.0.1 --port "$PORT" &
app=$!
wait "$app"

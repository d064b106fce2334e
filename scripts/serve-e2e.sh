#!/usr/bin/env bash
# Started by Playwright: a fresh e2e database with demo data, a fake SMTP server, and the built app on :3100.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
bash scripts/db.sh up >/dev/null
bash scripts/db.sh create loopwright_e2e
export DATABASE_URL="$(db_url loopwright_e2e)"
export NEXTAUTH_URL="http://localhost:3100"
export NEXTAUTH_SECRET="$(cat "$DATA_DIR/session-secret")"
export SMTP_PORT=2626
export LOOPWRIGHT_DEV_OUTBOX=1
npx tsx scripts/migrate.ts
npx tsx scripts/seed.ts
bash scripts/mail-sink.sh stop 2626
bash scripts/mail-sink.sh start 2626 "$DATABASE_URL"
trap 'bash scripts/mail-sink.sh stop 2626' EXIT
npx next start --hostname 127.0.0.1 --port 3100

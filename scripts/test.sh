#!/usr/bin/env bash
# The whole suite: lint, types, unit and property tests, integration tests against a fresh
# MariaDB test database, then browser tests in Debian's Chromium against a production build.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"

ensure_debian_packages mariadb-server mariadbd chromium chromium
ensure_node_modules
bash scripts/db.sh up

export NEXTAUTH_SECRET="$(cat "$DATA_DIR/session-secret")"

echo "== lint"; npx eslint . --max-warnings=0
echo "== types"; npx tsc --noEmit -p .
echo "== unit and property tests"; npx vitest run --project unit

# built before the integration tests: the database fault test runs the production server (next start)
echo "== production build"; npx next build

echo "== integration tests (MariaDB database loopwright_test, created fresh; a private MariaDB on 3326 for the fault test)"
bash scripts/db.sh create loopwright_test
DATABASE_URL="$(db_url loopwright_test)" NEXTAUTH_URL="http://localhost:3100" npx vitest run --project integration

echo "== browser tests (Chromium, database loopwright_e2e, created fresh)"
npx playwright test

#!/usr/bin/env bash
# One command from a fresh clone to the app on http://localhost:3000 (bound to 127.0.0.1):
# npm packages, MariaDB (Debian package), migrations, demo data, fake SMTP and S3, production build, server.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"

ensure_system start  # lists what is missing (scripts/doctor.sh), installs mariadb-server if needed
ensure_node_modules
bash scripts/db.sh up

export DATABASE_URL="$(db_url loopwright)"
export NEXTAUTH_URL="http://localhost:3000"
export NEXTAUTH_SECRET="$(cat "$DATA_DIR/session-secret")"
export SMTP_PORT

npx tsx scripts/migrate.ts
npx tsx scripts/seed.ts

bash scripts/mail-sink.sh start "$SMTP_PORT" "$DATABASE_URL"
export_s3_env "$S3_PORT"
bash scripts/s3-sink.sh start "$S3_PORT"

# Rebuild only when a source file is newer than the last build.
if [ ! -f .next/BUILD_ID ] || [ -n "$(find app components lib catalog models fonts public instrumentation.ts proxy.ts next.config.mjs postcss.config.mjs package-lock.json -newer .next/BUILD_ID -type f -print -quit 2>/dev/null)" ]; then
  npx next build
fi

echo "Loopwright on http://localhost:3000 — demo sign-ins are in README.md; demo mail at http://127.0.0.1:$((SMTP_PORT + 1))/. Ctrl-C stops the app; npm run stop stops MariaDB, the mail sink and the fake S3 server."
# one app process per core behind port 3000 (LOOPWRIGHT_APP_PROCESSES=N for another count; 1 is a plain next start)
exec node scripts/serve-every-core.mjs --hostname 127.0.0.1 --port 3000

#!/usr/bin/env bash
# Restores an archive made by backup.sh into an EMPTY database (created if missing) and the object store.
#   scripts/restore.sh ARCHIVE [DATABASE]      default database: loopwright
set -euo pipefail
source "$(dirname "$0")/env.sh"
bash "$ROOT/scripts/doctor.sh" --for backup --quiet || exit 1 # names what is missing
archive="${1:?archive made by scripts/backup.sh}"
db="${2:-loopwright}"
[[ "$db" =~ ^loopwright[a-z0-9_]*$ ]] || { echo "refusing: database name must start with loopwright" >&2; exit 1; }
client() { mariadb --no-defaults --socket="$DB_SOCKET" -uroot "$@"; }
client -e "CREATE DATABASE IF NOT EXISTS \`$db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci"
tables="$(client -N -e "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema='$db'")"
[ "$tables" = 0 ] || { echo "refusing: database $db is not empty ($tables tables); restore into an empty instance" >&2; exit 1; }
work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT
tar -xzf "$archive" -C "$work"
[ -f "$work/database.sql" ] || { echo "not a Loopwright backup: database.sql missing" >&2; exit 1; }
client "$db" < "$work/database.sql"
if [ -z "${S3_ENDPOINT+x}" ] && [ -f "$DATA_DIR/s3-sink-$S3_PORT.pid" ]; then export_s3_env "$S3_PORT"; fi
if [ -n "${S3_ENDPOINT:-}" ] && [ -d "$work/objects" ]; then (cd "$ROOT" && npx tsx scripts/objects.ts import "$work/objects"); fi
echo "restored $archive into $db"

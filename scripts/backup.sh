#!/usr/bin/env bash
# Dumps a database and the uploaded files into one archive.
#   scripts/backup.sh [ARCHIVE] [DATABASE]     default: .data/backups/loopwright-<UTC time>.tar.gz, database loopwright
set -euo pipefail
source "$(dirname "$0")/env.sh"
bash "$ROOT/scripts/doctor.sh" --for backup --quiet || exit 1 # names what is missing
db="${2:-loopwright}"
out="${1:-$DATA_DIR/backups/loopwright-$(date -u +%Y%m%dT%H%M%SZ).tar.gz}"
mkdir -p "$(dirname "$out")"
work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT
# --single-transaction: a consistent snapshot without locking writers (InnoDB).
mariadb-dump --no-defaults --socket="$DB_SOCKET" -uroot --single-transaction --routines --triggers --hex-blob \
  --default-character-set=utf8mb4 "$db" > "$work/database.sql"
mkdir -p "$work/objects"
# Objects come from the running fake S3 server (npm start) unless S3_ENDPOINT names another store.
if [ -z "${S3_ENDPOINT+x}" ] && [ -f "$DATA_DIR/s3-sink-$S3_PORT.pid" ]; then export_s3_env "$S3_PORT"; fi
if [ -n "${S3_ENDPOINT:-}" ]; then (cd "$ROOT" && npx tsx scripts/objects.ts export "$work/objects"); fi
printf '{"database":"%s","createdAt":"%s","format":1}\n' "$db" "$(date -u +%FT%TZ)" > "$work/manifest.json"
tar -czf "$out" -C "$work" manifest.json database.sql objects
echo "backup written: $out"

#!/usr/bin/env bash
# Stops the fake SMTP and S3 servers and shuts MariaDB down cleanly (data is kept in .data/).
set -euo pipefail
source "$(dirname "$0")/env.sh"
for f in "$DATA_DIR"/mail-sink-*.pid; do
  [ -e "$f" ] || continue
  p="${f##*mail-sink-}"; bash "$ROOT/scripts/mail-sink.sh" stop "${p%.pid}"
done
for f in "$DATA_DIR"/s3-sink-*.pid; do
  [ -e "$f" ] || continue
  p="${f##*s3-sink-}"; bash "$ROOT/scripts/s3-sink.sh" stop "${p%.pid}"
done
bash "$ROOT/scripts/db.sh" down

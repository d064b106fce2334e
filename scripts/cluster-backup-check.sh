#!/usr/bin/env bash
# Backup round trip from the cluster: `npm run backup` against a synced node (a consistent snapshot with
# --single-transaction, no lock that would stall the cluster), restored into a single fresh MariaDB on
# 127.0.0.1:3339 (.data/mariadb-3339, made anew and shut down at the end); every table's row count and
# checksum must equal the node's. Run by `npm run test:cluster` after the fault test.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
node_sock="$DATA_DIR/cluster/node2/mysqld.sock"
fresh_port=3339
work="$(mktemp -d)"
cleanup() { LOOPWRIGHT_DB_PORT=$fresh_port bash scripts/db.sh down >/dev/null 2>&1 || true; rm -rf "$work"; }
trap cleanup EXIT
export S3_ENDPOINT="" # the cluster has no object store; the round trip is the database's

LOOPWRIGHT_DB_SOCKET="$node_sock" bash scripts/backup.sh "$work/cluster.tar.gz" loopwright
LOOPWRIGHT_DB_PORT=$fresh_port bash scripts/db.sh down >/dev/null 2>&1 || true
rm -rf "$DATA_DIR/mariadb-$fresh_port"
LOOPWRIGHT_DB_PORT=$fresh_port bash scripts/db.sh up
LOOPWRIGHT_DB_PORT=$fresh_port bash scripts/restore.sh "$work/cluster.tar.gz" loopwright_restored

# table, rows, checksum — one line per table
figures() {
  local sock="$1" db="$2" t
  for t in $(mariadb --no-defaults --socket="$sock" -uroot -N -B -e "SELECT TABLE_NAME FROM information_schema.TABLES WHERE TABLE_SCHEMA='$db' AND TABLE_TYPE='BASE TABLE' ORDER BY TABLE_NAME"); do
    printf '%s %s %s\n' "$t" \
      "$(mariadb --no-defaults --socket="$sock" -uroot -N -B -e "SELECT COUNT(*) FROM \`$db\`.\`$t\`")" \
      "$(mariadb --no-defaults --socket="$sock" -uroot -N -B -e "CHECKSUM TABLE \`$db\`.\`$t\` EXTENDED" | cut -f2)"
  done
}
figures "$node_sock" loopwright >"$work/cluster.txt"
figures "$DATA_DIR/mariadb-$fresh_port/mysqld.sock" loopwright_restored >"$work/restored.txt"
tables="$(wc -l <"$work/cluster.txt")"; rows="$(awk '{s += $2} END {print s}' "$work/cluster.txt")"
if diff -u "$work/cluster.txt" "$work/restored.txt"; then
  echo "backup round trip: $tables tables, $rows rows, equal row counts and checksums on the cluster node and the fresh MariaDB"
else
  echo "backup round trip FAILED: the restored database differs (above: table rows checksum)" >&2
  exit 1
fi

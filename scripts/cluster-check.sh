#!/usr/bin/env bash
# HAProxy's health check of one Galera node (external-check: args proxy address, proxy port, server address,
# server port). Healthy only when the node is Synced and ready: a joining, donor or cut-off node still accepts
# connections but refuses or delays queries.
dir="$(cd "$(dirname "$0")/.." && pwd)/.data/cluster/node$(($4 - 3330))"
out="$(mariadb --no-defaults --socket="$dir/mysqld.sock" -uroot -N -B --connect-timeout=1 \
  -e "SHOW GLOBAL STATUS WHERE Variable_name IN ('wsrep_local_state', 'wsrep_ready')" 2>/dev/null)" || exit 1
grep -qx $'wsrep_local_state\t4' <<<"$out" && grep -qx $'wsrep_ready\tON' <<<"$out"

#!/usr/bin/env bash
# scripts/mail-sink.sh start PORT DATABASE_URL | stop PORT — SMTP on PORT, the mail page on PORT+1 (both loopback)
set -euo pipefail
source "$(dirname "$0")/env.sh"
port="${2:?port}"
pidfile="$DATA_DIR/mail-sink-$port.pid"
case "$1" in
  start)
    if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then echo "mail sink already running on 127.0.0.1:$port"; exit 0; fi
    DATABASE_URL="${3:?database url}" SMTP_PORT="$port" setsid npx tsx "$ROOT/scripts/mail-sink.ts" >"$DATA_DIR/mail-sink-$port.log" 2>&1 </dev/null &
    echo $! >"$pidfile"
    for _ in $(seq 1 50); do grep -q listening "$DATA_DIR/mail-sink-$port.log" 2>/dev/null && break; sleep 0.2; done
    grep -q listening "$DATA_DIR/mail-sink-$port.log" || { echo "mail sink did not start:" >&2; cat "$DATA_DIR/mail-sink-$port.log" >&2; exit 1; }
    echo "mail sink on 127.0.0.1:$port; read the mail at http://127.0.0.1:$((port + 1))/"
    ;;
  stop)
    if [ -f "$pidfile" ]; then kill -- -"$(cat "$pidfile")" 2>/dev/null || kill "$(cat "$pidfile")" 2>/dev/null || true; rm -f "$pidfile"; fi
    ;;
esac

#!/usr/bin/env bash
# scripts/s3-sink.sh start PORT [DIR] | stop PORT
# A fake S3 server on 127.0.0.1:PORT (s3rver) keeping its objects under DIR (default .data/s3-PORT),
# with the bucket $S3_BUCKET (default loopwright-photos) created. Point the app at it with
# S3_ENDPOINT=http://127.0.0.1:PORT S3_BUCKET=... S3_ACCESS_KEY=S3RVER S3_SECRET_KEY=S3RVER.
set -euo pipefail
source "$(dirname "$0")/env.sh"
port="${2:?port}"
pidfile="$DATA_DIR/s3-sink-$port.pid"
log="$DATA_DIR/s3-sink-$port.log"
case "$1" in
  start)
    if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then echo "fake S3 already running on 127.0.0.1:$port"; exit 0; fi
    dir="${3:-$DATA_DIR/s3-$port}"
    S3_SINK_PORT="$port" S3_SINK_DIR="$dir" setsid npx tsx "$ROOT/scripts/s3-sink.ts" >"$log" 2>&1 </dev/null &
    echo $! >"$pidfile"
    for _ in $(seq 1 50); do grep -q listening "$log" 2>/dev/null && break; sleep 0.2; done
    grep -q listening "$log" || { echo "fake S3 did not start:" >&2; cat "$log" >&2; exit 1; }
    grep listening "$log"
    ;;
  stop)
    if [ -f "$pidfile" ]; then kill -- -"$(cat "$pidfile")" 2>/dev/null || kill "$(cat "$pidfile")" 2>/dev/null || true; rm -f "$pidfile"; fi
    ;;
  *)
    echo "usage: scripts/s3-sink.sh start PORT [DIR] | stop PORT" >&2
    exit 2
    ;;
esac

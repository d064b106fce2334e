#!/usr/bin/env bash
# The whole suite: lint, types, unit and property tests, integration tests against a fresh
# MariaDB test database, then browser tests in Debian's Chromium against a production build.
#   scripts/test.sh [STAGE ...] [-- ARGS]   stages: lint types unit build integration e2e (default: all, in that order);
#                                           ARGS go to vitest or playwright, e.g. `npm test -- e2e -- tests/e2e/catalog.spec.ts`
# Whatever the outcome, everything the run started is stopped at the end: the fake SMTP and S3 servers, the
# servers Playwright and the tests start, private MariaDB instances, and the main MariaDB unless it was
# already running before.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"

all_stages=(lint types unit build integration e2e)
stages=()
passthrough=()
while [ $# -gt 0 ]; do
  case "$1" in
    --) shift; passthrough=("$@"); break ;;
    lint | types | unit | build | integration | e2e) stages+=("$1"); shift ;;
    *) echo "unknown stage '$1'; stages: ${all_stages[*]}" >&2; exit 2 ;;
  esac
done
[ ${#stages[@]} -gt 0 ] || stages=("${all_stages[@]}")
wants() { [[ " ${stages[*]} " == *" $1 "* ]]; }

# Every process this run starts inherits this mark in its environment: at the end the run stops exactly those,
# and nothing of another run or of `npm start` (a MariaDB already running before has no mark and stays up).
export LOOPWRIGHT_TEST_RUN="$$.$(date +%s%N)"

# Is PID one of this run's processes? Its environment (as it was at its start) carries the mark.
ours() {
  local kv
  [ -r "/proc/$1/environ" ] || return 1
  { while IFS= read -r -d '' kv; do [ "$kv" = "LOOPWRIGHT_TEST_RUN=$LOOPWRIGHT_TEST_RUN" ] && return 0; done < "/proc/$1/environ"; } 2>/dev/null
  return 1
}

our_pids() {
  local d
  for d in /proc/[0-9]*; do
    [ "${d#/proc/}" = "$$" ] && continue
    ours "${d#/proc/}" && echo "${d#/proc/}"
  done
  return 0
}

stop_everything() {
  local status=$? f pid port dir left
  trap - EXIT INT TERM
  set +e
  echo "== stopping what this run started"
  # the fake SMTP and S3 servers, through their own stop (removes the pid file)
  for f in "$DATA_DIR"/mail-sink-*.pid "$DATA_DIR"/s3-sink-*.pid; do
    [ -e "$f" ] || continue
    pid="$(cat "$f" 2>/dev/null)"
    [ -n "$pid" ] && ours "$pid" || continue
    port="${f##*-}"; port="${port%.pid}"
    case "$f" in */mail-sink-*) bash scripts/mail-sink.sh stop "$port" ;; *) bash scripts/s3-sink.sh stop "$port" ;; esac
  done
  # MariaDB instances this run started, shut down cleanly: a private one (the fault test's) or the main one when it was down
  for f in "$DATA_DIR"/mariadb/mysqld.pid "$DATA_DIR"/mariadb-*/mysqld.pid; do
    [ -e "$f" ] || continue
    pid="$(cat "$f" 2>/dev/null)"
    [ -n "$pid" ] && ours "$pid" || continue
    dir="$(basename "$(dirname "$f")")"
    if [ "$dir" = mariadb ]; then port=3316; else port="${dir#mariadb-}"; fi
    LOOPWRIGHT_DB_PORT="$port" bash scripts/db.sh down
  done
  # anything else still running: servers the tests or Playwright started, browsers, workers
  left="$(our_pids)"
  if [ -n "$left" ]; then
    # shellcheck disable=SC2086 # one pid a line
    kill -TERM $left 2>/dev/null
    for _ in $(seq 1 50); do
      left="$(for pid in $left; do kill -0 "$pid" 2>/dev/null && echo "$pid"; done)"
      [ -z "$left" ] && break
      sleep 0.2
    done
    # shellcheck disable=SC2086
    [ -n "$left" ] && kill -KILL $left 2>/dev/null
  fi
  left="$(our_pids)"
  if [ -n "$left" ]; then echo "still running after the test command (pids): $left" >&2; else echo "nothing of this run is left running"; fi
  exit "$status"
}
trap stop_everything EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

# A stage runs in the background and is waited for: bash runs a trap only after the foreground command has ended,
# so a signal to this script (Ctrl-C, a CI timeout) goes straight to the cleanup, which ends the stage.
run() {
  "$@" &
  wait "$!"
}

ensure_system test # lists what is missing (scripts/doctor.sh), installs mariadb-server and chromium if needed
ensure_node_modules

export NEXTAUTH_SECRET="$(cat "$DATA_DIR/session-secret")"

if wants lint; then echo "== lint"; run npx eslint . --max-warnings=0; fi
if wants types; then echo "== types"; run npx tsc --noEmit -p .; fi
if wants unit; then echo "== unit and property tests"; run npx vitest run --project unit "${passthrough[@]}"; fi

# built before the integration tests: the database fault test runs the production server (next start)
if wants build; then echo "== production build"; run npx next build; fi

if wants integration || wants e2e; then bash scripts/db.sh up; fi

if wants integration; then
  test_db="${LOOPWRIGHT_TEST_DB:-loopwright_test}"
  echo "== integration tests (MariaDB database $test_db, created fresh; a private MariaDB on 3326 for the fault test)"
  bash scripts/db.sh create "$test_db"
  run env DATABASE_URL="$(db_url "$test_db")" NEXTAUTH_URL="http://localhost:3100" npx vitest run --project integration "${passthrough[@]}"
fi

if wants e2e; then
  echo "== browser tests (Chromium, database loopwright_e2e_${E2E_PORT:-3100}, created fresh)"
  run npx playwright test "${passthrough[@]}"
fi

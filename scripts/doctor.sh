#!/usr/bin/env bash
# Lists every system program Loopwright's commands need, whether it is here, and what installs it.
#   scripts/doctor.sh [--for start|test|backup|all] [--quiet] [--packages]
#     --for       only what that command needs (default all: every command of the project)
#     --quiet     print the list only when something required is missing
#     --packages  print only the Debian packages that would install what is missing, one a line
# Exit status 1 when something required is missing. Plain bash: it must run before Node.js is installed.
set -uo pipefail

purpose=all
quiet=0
packages_only=0
while [ $# -gt 0 ]; do
  case "$1" in
    --for) purpose="${2:?start, test, backup or all}"; shift 2 ;;
    --quiet) quiet=1; shift ;;
    --packages) packages_only=1; shift ;;
    *) echo "usage: scripts/doctor.sh [--for start|test|backup|all] [--quiet] [--packages]" >&2; exit 2 ;;
  esac
done
case "$purpose" in start | test | backup | all) ;; *) echo "doctor: --for takes start, test, backup or all" >&2; exit 2 ;; esac

# program | Debian package (empty: Node.js, whose Debian 12 package is too old) | the commands that need it (empty: all) | what it is for
checks=(
  "node|||Node.js 20.9 or later (or 22+): the app, the scripts, the tests"
  "npm||start test|npm packages (npm ci) and the package scripts"
  "npx||start test backup|runs tsx, next, vitest and playwright from node_modules"
  "mariadbd|mariadb-server|start test|MariaDB server (scripts/db.sh up)"
  "mariadb-install-db|mariadb-server|start test|initialises the MariaDB data folder once (scripts/db.sh up)"
  "mariadb-admin|mariadb-client|start test|MariaDB ping and clean shutdown (scripts/db.sh, npm run stop)"
  "mariadb|mariadb-client|start test backup|MariaDB client (scripts/db.sh create/sql, npm run restore)"
  "mariadb-dump|mariadb-client|test backup|database dump (npm run backup; its integration test)"
  "setsid|util-linux|start test|starts MariaDB, the mail sink and the fake S3 server in their own sessions"
  "tar|tar|test backup|backup archives (npm run backup / restore; its integration test)"
  "gzip|gzip|test backup|backup archives are .tar.gz"
  "/usr/bin/chromium|chromium|test|the browser of the Playwright tests (npm test; never a browser download)"
)

# node needs a version check, not only presence: package.json "engines" says >=20.9 <21 || >=22.
node_ok() {
  command -v node >/dev/null 2>&1 || return 1
  local v major minor
  v="$(node -p 'process.versions.node' 2>/dev/null)" || return 1
  major="${v%%.*}"; minor="${v#*.}"; minor="${minor%%.*}"
  [ "$major" -ge 22 ] || { [ "$major" -eq 20 ] && [ "$minor" -ge 9 ]; }
}

present() {
  case "$1" in
    node) node_ok ;;
    /*) [ -x "$1" ] ;;
    *) command -v "$1" >/dev/null 2>&1 ;;
  esac
}

version_of() {
  case "$1" in
    node) command -v node >/dev/null 2>&1 && node -p 'process.versions.node' 2>/dev/null ;;
    *) return 0 ;;
  esac
}

needed_for() { # needed_for "start test" → does $purpose need it?
  [ "$purpose" = all ] && return 0
  [ -z "$1" ] && return 0 # node: every command
  [[ " $1 " == *" $purpose "* ]]
}

if [ "$(id -u)" = 0 ]; then apt="apt-get install"; else apt="sudo apt-get install"; fi

lines=()
missing=0
missing_packages=()
for row in "${checks[@]}"; do
  IFS='|' read -r program package uses what <<<"$row"
  needed_for "$uses" || continue
  if present "$program"; then
    state="ok"
    v="$(version_of "$program")"; [ -n "$v" ] && state="ok $v"
  else
    missing=1
    state="MISSING"
    if [ "$program" = node ] && command -v node >/dev/null 2>&1; then state="TOO OLD $(version_of node)"; fi
    if [ -n "$package" ] && [[ " ${missing_packages[*]} " != *" $package "* ]]; then missing_packages+=("$package"); fi
  fi
  if [ -n "$package" ]; then how="$apt $package"; else how="Node.js 20.9+ (nodejs.org)"; fi
  lines+=("$(printf '  %-16s %-19s %-36s %s' "$state" "${program#/usr/bin/}" "$how" "$what")")
done

if [ "$packages_only" = 1 ]; then
  [ ${#missing_packages[@]} -gt 0 ] && printf '%s\n' "${missing_packages[@]}"
  exit "$missing"
fi

if [ "$quiet" = 0 ] || [ "$missing" = 1 ]; then
  case "$purpose" in
    all) echo "System programs Loopwright needs:" ;;
    backup) echo "System programs 'npm run backup' and 'npm run restore' need:" ;;
    *) echo "System programs 'npm $purpose' needs:" ;;
  esac
  printf '  %-16s %-19s %-36s %s\n' "state" "program" "installed by" "used for"
  printf '%s\n' "${lines[@]}"
  if [ ${#missing_packages[@]} -gt 0 ]; then echo "To install what is missing: $apt ${missing_packages[*]}"; fi
  # Only used to install the packages above when they are missing.
  if [ "$(id -u)" != 0 ] && ! command -v sudo >/dev/null 2>&1; then echo "(neither root nor sudo here: the scripts cannot install Debian packages themselves)"; fi
  if ! command -v apt-get >/dev/null 2>&1; then echo "(no apt-get here: install the programs above with this system's package manager)"; fi
fi
exit "$missing"

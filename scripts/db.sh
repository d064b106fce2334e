#!/usr/bin/env bash
# Private MariaDB instance on loopback, data under .data/mariadb (git-ignored).
#   scripts/db.sh up            install if missing, initialise once, start, wait, create app database + user
#   scripts/db.sh down          clean shutdown
#   scripts/db.sh status        exit 0 when it answers
#   scripts/db.sh create NAME   (re)create an empty database NAME owned by the app user
#   scripts/db.sh sql           open a client as root
set -euo pipefail
source "$(dirname "$0")/env.sh"

admin() { mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot "$@"; }
client() { mariadb --no-defaults --socket="$DB_SOCKET" -uroot "$@"; }
running() { [ -S "$DB_SOCKET" ] && admin ping >/dev/null 2>&1; }

up() {
  ensure_debian_packages mariadb-server mariadbd
  if running; then echo "MariaDB already running on 127.0.0.1:$DB_PORT"; else
    if [ ! -d "$DB_DIR/data/mysql" ]; then
      echo "Initialising MariaDB data directory in $DB_DIR/data"
      mkdir -p "$DB_DIR/data"
      mariadb-install-db --no-defaults --user="$(id -un)" --datadir="$DB_DIR/data" \
        --auth-root-authentication-method=normal --skip-test-db >"$DB_DIR/install.log" 2>&1
    fi
    # Another instance (another checkout's data folder) already holding the port would make this start fail obscurely.
    if (exec 3<>"/dev/tcp/127.0.0.1/$DB_PORT") 2>/dev/null; then
      echo "Port $DB_PORT is taken by another server (another checkout's MariaDB?). Set LOOPWRIGHT_DB_PORT to a free port for a private instance." >&2
      exit 1
    fi
    rm -f "$DB_SOCKET"
    # setsid: the server outlives the shell that started it.
    setsid mariadbd --no-defaults --user="$(id -un)" --datadir="$DB_DIR/data" \
      --bind-address=127.0.0.1 --port="$DB_PORT" --socket="$DB_SOCKET" \
      --pid-file="$DB_DIR/mysqld.pid" --log-error="$DB_DIR/error.log" --skip-name-resolve \
      --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
      --max-connections=300 </dev/null >/dev/null 2>&1 &
    for _ in $(seq 1 100); do running && break; sleep 0.2; done
    running || { echo "MariaDB did not start; see $DB_DIR/error.log" >&2; tail -20 "$DB_DIR/error.log" >&2; exit 1; }
    echo "MariaDB started on 127.0.0.1:$DB_PORT"
  fi
  client -e "CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
             CREATE DATABASE IF NOT EXISTS loopwright CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
             GRANT ALL PRIVILEGES ON \`loopwright%\`.* TO '$DB_USER'@'127.0.0.1';"
}

down() {
  if running; then admin shutdown && echo "MariaDB on 127.0.0.1:$DB_PORT stopped"; else echo "MariaDB is not running"; fi
}

create() {
  local name="$1"
  [[ "$name" =~ ^loopwright_[a-z0-9_]+$ ]] || { echo "refusing: database name must start with loopwright_" >&2; exit 1; }
  client -e "DROP DATABASE IF EXISTS \`$name\`; CREATE DATABASE \`$name\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
}

case "${1:-}" in
  up) up ;;
  down) down ;;
  status) if running; then echo "MariaDB running on 127.0.0.1:$DB_PORT"; else echo "MariaDB is not running on 127.0.0.1:$DB_PORT"; exit 1; fi ;;
  create) create "${2:?database name}" ;;
  sql) client ;;
  *) echo "usage: scripts/db.sh up|down|status|create NAME|sql" >&2; exit 2 ;;
esac

#!/usr/bin/env bash
# The project's private MariaDB: data under .data/, loopback only, never the system instance.
# Usage: scripts/db.sh up | down | status | reset
set -euo pipefail
source "$(dirname "$0")/env.sh"
MYDIR="$DATA_DIR/mysql"
ADMIN=(mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot)
CLIENT=(mariadb --no-defaults --socket="$DB_SOCKET" -uroot)

alive() { "${ADMIN[@]}" ping >/dev/null 2>&1; }

up() {
  ensure_debian
  mkdir -p "$DATA_DIR"
  if alive; then log "MariaDB already running on 127.0.0.1:$DB_PORT"; else
    if [ ! -d "$MYDIR/mysql" ]; then
      log "initialising MariaDB data directory in $MYDIR"
      rm -rf "$MYDIR"
      mariadb-install-db --no-defaults --datadir="$MYDIR" --user="$(id -un)" \
        --auth-root-authentication-method=socket --skip-test-db >"$DATA_DIR/mysql-init.log" 2>&1
    fi
    rm -f "$DB_SOCKET" "$DATA_DIR/mysqld.pid"
    setsid mariadbd --no-defaults --user="$(id -un)" --datadir="$MYDIR" --socket="$DB_SOCKET" \
      --port="$DB_PORT" --bind-address=127.0.0.1 --pid-file="$DATA_DIR/mysqld.pid" \
      --log-error="$DATA_DIR/mysqld.err" --skip-name-resolve --character-set-server=utf8mb4 \
      --collation-server=utf8mb4_unicode_ci --default-time-zone=+00:00 --log-bin-trust-function-creators=1 \
      --max-connections=300 </dev/null >/dev/null 2>&1 &
    for _ in $(seq 1 100); do alive && break; sleep 0.2; done
    alive || { echo "MariaDB did not start; see $DATA_DIR/mysqld.err" >&2; tail -20 "$DATA_DIR/mysqld.err" >&2; exit 1; }
    log "MariaDB up on 127.0.0.1:$DB_PORT (data in $MYDIR)"
  fi
  create_db "$DB_NAME"
}

# The database and its two users. The app's user gets no database-wide privilege here: its table-level
# grants (rows only; trail_events SELECT and INSERT) are given by the migrate script after each migration.
create_db() {
  local name="$1" h
  [ "$DB_USER" != "$DB_MIGRATOR_USER" ] || { echo "DB_USER and DB_MIGRATOR_USER must differ" >&2; exit 2; }
  {
    echo "CREATE DATABASE IF NOT EXISTS \`$name\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
    for h in 127.0.0.1 localhost; do
      echo "CREATE USER IF NOT EXISTS '$DB_USER'@'$h' IDENTIFIED BY '$DB_PASSWORD';"
      echo "CREATE USER IF NOT EXISTS '$DB_MIGRATOR_USER'@'$h' IDENTIFIED BY '$DB_MIGRATOR_PASSWORD';"
      echo "GRANT ALL PRIVILEGES ON \`$name\`.* TO '$DB_MIGRATOR_USER'@'$h' WITH GRANT OPTION;"
      echo "GRANT ALL PRIVILEGES ON \`${DB_NAME}_test%\`.* TO '$DB_MIGRATOR_USER'@'$h' WITH GRANT OPTION;"
    done
    # An older set-up gave the app's user ALL on the database: take every database-wide grant back.
    echo "DELETE FROM mysql.db WHERE User = '$DB_USER';"
    echo "FLUSH PRIVILEGES;"
  } | "${CLIENT[@]}"
}

down() {
  if alive; then "${ADMIN[@]}" shutdown; log "MariaDB stopped"; else log "MariaDB was not running"; fi
}

reset() {
  alive || up
  "${CLIENT[@]}" -e "DROP DATABASE IF EXISTS \`$DB_NAME\`;"
  create_db "$DB_NAME"
}

case "${1:-}" in
  up) up ;;
  down) down ;;
  status) alive && echo "running on 127.0.0.1:$DB_PORT" || { echo "stopped"; exit 1; } ;;
  reset) reset ;;
  create) create_db "${2:?name}" ;;
  *) echo "usage: $0 up|down|status|reset|create NAME" >&2; exit 2 ;;
esac

#!/usr/bin/env bash
# npm start — everything a fresh machine needs, then the product with demo data at http://localhost:3000.
# Ctrl-C stops what this script started.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
export PORT="${PORT:-3000}"

ensure_debian
ensure_node_modules

started_db=0
bash scripts/db.sh status >/dev/null 2>&1 || started_db=1
bash scripts/db.sh up
pids=()
cleanup() {
  trap - INT TERM EXIT
  log "stopping…"
  for p in "${pids[@]}"; do kill -- -"$p" 2>/dev/null || kill "$p" 2>/dev/null || true; done
  [ -f "$DATA_DIR/maildev-$SMTP_PORT.pid" ] && { kill "$(cat "$DATA_DIR/maildev-$SMTP_PORT.pid")" 2>/dev/null || true; rm -f "$DATA_DIR/maildev-$SMTP_PORT.pid"; }
  [ "$started_db" = 1 ] && bash scripts/db.sh down || true
  log "stopped"
}
trap cleanup INT TERM EXIT

# Migrations and grants run as the migrator (MIGRATOR_URL); the app as its own user (DATABASE_URL).
npx tsx scripts/migrate.ts
npx tsx --conditions=react-server scripts/seed.ts --if-empty
bash scripts/mail.sh

if [ "${PLACET_SKIP_BUILD:-0}" != 1 ] || [ ! -f .next/BUILD_ID ]; then
  log "building the app (about 30 s)"
  npx next build >"$DATA_DIR/build.log" 2>&1 || { tail -40 "$DATA_DIR/build.log"; exit 1; }
fi

PLACET_DEMO=1 setsid npx next start -H 127.0.0.1 -p "$PORT" &
pids+=($!)
node scripts/wait-for.mjs 60 "http://127.0.0.1:$PORT/api/health" || exit 1

cat <<MSG

  Placet is running at http://localhost:$PORT   (use "localhost", not 127.0.0.1: sign-in cookies are set for it)
  Mail inbox (sign-in links land here): http://localhost:$MAIL_WEB_PORT
  Database users: the app runs as $DB_USER (rows only; trail_events: SELECT and INSERT, nothing else);
  migrations as $DB_MIGRATOR_USER (tables, triggers, grants).

  Sign in with any of these invented demo people; the link arrives in the inbox above:
    tamsin@hollowmere.test    studio owner        (Hollowmere Glass)
    elias@hollowmere.test     designer            (Hollowmere Glass)
    margaret@stwenna.test     chair               (St Wenna's building committee)
    david@stwenna.test        committee member
    ruth@stwenna.test         committee member
    colin@stwenna.test        committee member, treasurer
    priya@stwenna.test        adviser (comments, no vote)
    owen@thrennick.test     chair of another commission (sees only his own)

  npm run db:seed resets the demo. Ctrl-C stops everything.
MSG
wait "${pids[0]}"

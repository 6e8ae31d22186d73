#!/usr/bin/env bash
# npm run dev — the database, the mail catcher and `next dev` with hot reload.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
ensure_debian
ensure_node_modules
bash scripts/db.sh up
npx tsx scripts/migrate.ts
npx tsx --conditions=react-server scripts/seed.ts --if-empty
bash scripts/mail.sh
exec npx next dev -H 127.0.0.1 -p "${PORT:-3000}"

#!/usr/bin/env bash
# Starts the local mail catcher in the background (SMTP on $SMTP_PORT, inbox on $MAIL_WEB_PORT); prints its pid.
set -euo pipefail
source "$(dirname "$0")/env.sh"
mkdir -p "$DATA_DIR/mail-$SMTP_PORT"
if (exec 3<>/dev/tcp/127.0.0.1/"$SMTP_PORT") 2>/dev/null; then log "mail catcher already listening on $SMTP_PORT"; exit 0; fi
setsid "$ROOT/node_modules/.bin/maildev" --smtp "$SMTP_PORT" --web "$MAIL_WEB_PORT" --ip 127.0.0.1 --web-ip 127.0.0.1 \
  --mail-directory "$DATA_DIR/mail-$SMTP_PORT" </dev/null >"$DATA_DIR/maildev-$SMTP_PORT.log" 2>&1 &
echo $! > "$DATA_DIR/maildev-$SMTP_PORT.pid"
for _ in $(seq 1 50); do (exec 3<>/dev/tcp/127.0.0.1/"$MAIL_WEB_PORT") 2>/dev/null && break; sleep 0.2; done
log "mail catcher: SMTP 127.0.0.1:$SMTP_PORT, inbox http://localhost:$MAIL_WEB_PORT"

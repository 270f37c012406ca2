#!/usr/bin/env bash
# start_services: the mail sink, the collaboration server and the Next.js app, in the background.
# Sourced after lib.sh; expects DATABASE_URL, APP_PORT, COLLAB_PORT, SMTP_PORT in the environment.
SERVICE_PIDS=()

start_services() {
  local logdir="$1"; mkdir -p "$logdir"
  export SMTP_HOST=127.0.0.1 JOULEBOOK_OUTBOX=1
  export APP_URL="${APP_URL:-http://127.0.0.1:$APP_PORT}"
  export COLLAB_URL="${COLLAB_URL:-ws://127.0.0.1:$COLLAB_PORT}"
  (cd "$ROOT" && exec node --import tsx server/mail-sink.ts) >"$logdir/mail-sink.log" 2>&1 &
  SERVICE_PIDS+=($!)
  if [ -f "$ROOT/server/collab.ts" ]; then
    (cd "$ROOT" && exec node --import tsx server/collab.ts) >"$logdir/collab.log" 2>&1 &
    SERVICE_PIDS+=($!)
  fi
  (cd "$ROOT" && exec node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$APP_PORT") >"$logdir/app.log" 2>&1 &
  SERVICE_PIDS+=($!)
  wait_port "$SMTP_PORT" "mail sink (log: $logdir/mail-sink.log)"
  [ -f "$ROOT/server/collab.ts" ] && wait_port "$COLLAB_PORT" "collaboration server (log: $logdir/collab.log)"
  wait_port "$APP_PORT" "app (log: $logdir/app.log)"
}

stop_services() {
  local pid
  for pid in "${SERVICE_PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  for pid in "${SERVICE_PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  SERVICE_PIDS=()
}

#!/usr/bin/env bash
# npm run demo: installs what is missing, starts PostgreSQL on loopback, migrates, seeds the
# demo workspace, builds and serves the app. Safe to run again (keeps data). Ctrl-C stops all.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
source "$(dirname "$0")/services.sh"
cd "$ROOT"

export PG_PORT="${PG_PORT:-54329}" APP_PORT="${APP_PORT:-3210}" COLLAB_PORT="${COLLAB_PORT:-3211}" SMTP_PORT="${SMTP_PORT:-2525}"
ensure_debian_packages
ensure_node_modules

PG_BASE="$(pg_base_for "$ROOT/.data/pg")"
cleanup() { trap - EXIT INT TERM; log "stopping"; stop_services; pg_stop "$PG_BASE"; }
trap cleanup EXIT
trap 'cleanup; exit 130' INT TERM

pg_start "$PG_BASE" "$PG_PORT"
pg_createdb "$PG_PORT" joulebook
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/joulebook"
export NODE_ENV=production

node --import tsx scripts/migrate.ts
node --import tsx scripts/seed.ts

if [ ! -f .next/BUILD_ID ] || [ -n "$(find app lib db components proxy.ts next.config.ts tailwind.config.ts postcss.config.mjs package-lock.json -newer .next/BUILD_ID -type f 2>/dev/null | head -n 1)" ]; then
  log "building the app (next build)"
  node node_modules/next/dist/bin/next build >"$ROOT/.data/build.log" 2>&1 || { tail -n 40 "$ROOT/.data/build.log"; die "next build failed (log: .data/build.log)"; }
fi

start_services "$ROOT/.data/logs"
node --import tsx scripts/seed.ts --print-signins
log "Joulebook is up: http://127.0.0.1:$APP_PORT  (Ctrl-C stops everything)"
wait -n "${SERVICE_PIDS[@]}" || true
log "a service stopped; see .data/logs/"

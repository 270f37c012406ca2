#!/usr/bin/env bash
# npm test: the demo's set-up against a throwaway database, then every test suite:
# unit and integration (vitest, real PostgreSQL), then browser tests against the built app.
set -uo pipefail
source "$(dirname "$0")/lib.sh"
source "$(dirname "$0")/services.sh"
cd "$ROOT"

export PG_PORT="${TEST_PG_PORT:-54339}" APP_PORT="${TEST_APP_PORT:-3220}" COLLAB_PORT="${TEST_COLLAB_PORT:-3221}" SMTP_PORT="${TEST_SMTP_PORT:-2535}"
ensure_debian_packages chromium
ensure_node_modules

PG_BASE="$(mktemp -d /tmp/joulebook-test-pg.XXXXXX)"; chmod 755 "$PG_BASE"
SUITES="${TEST_SUITES:-unit,integration,e2e}"   # a subset while working, e.g. TEST_SUITES=e2e
ART="${ARTIFACTS_DIR:-$ROOT/artifacts}"; rm -rf "$ART/results"; mkdir -p "$ART/results" "$ART/screenshots"
cleanup() { trap - EXIT INT TERM; stop_services; pg_stop "$PG_BASE"; rm -rf "$PG_BASE"; }
trap cleanup EXIT INT TERM

pg_start "$PG_BASE" "$PG_PORT" throwaway || exit 1
pg_createdb "$PG_PORT" joulebook_template
export TEST_PG_ADMIN_URL="postgres://postgres@127.0.0.1:$PG_PORT/postgres"
export TEST_TEMPLATE_DB=joulebook_template
DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/joulebook_template" node --import tsx scripts/migrate.ts || exit 1

status=0
projects=()
[[ ",$SUITES," == *,unit,* ]] && projects+=(--project unit)
[[ ",$SUITES," == *,integration,* ]] && projects+=(--project integration)
if [ ${#projects[@]} -gt 0 ]; then
  log "unit and integration tests"
  node node_modules/vitest/vitest.mjs run "${projects[@]}" \
    --reporter=default --reporter=json --outputFile.json="$ART/results/vitest.json" || status=1
fi
[[ ",$SUITES," == *,e2e,* ]] || { node scripts/summarize-tests.mjs "$ART/results"; exit $(( status || $? )); }

log "browser tests: building the app"
pg_createdb "$PG_PORT" joulebook_e2e
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/joulebook_e2e" NODE_ENV=production
node --import tsx scripts/migrate.ts || exit 1
node --import tsx scripts/seed.ts || exit 1
if node node_modules/next/dist/bin/next build >"$ART/build.log" 2>&1; then
  start_services "$ART/logs"
  export APP_URL="http://127.0.0.1:$APP_PORT"
  node node_modules/vitest/vitest.mjs run --project e2e \
    --reporter=default --reporter=json --outputFile.json="$ART/results/e2e.json" || status=1
  stop_services
else
  tail -n 60 "$ART/build.log"; log "next build failed (artifacts/build.log)"; status=1
fi

node scripts/summarize-tests.mjs "$ART/results" || status=1
exit $status

#!/usr/bin/env bash
# with-test-db.sh CMD...: runs CMD against a throwaway PostgreSQL (migrated template database
# joulebook_template) on TEST_PG_PORT (default 54349), then removes the cluster.
# For working on integration tests without the whole `npm test`:
#   TEST_PG_PORT=55001 bash scripts/with-test-db.sh npx vitest run --project integration
set -uo pipefail
source "$(dirname "$0")/lib.sh"
PORT="${TEST_PG_PORT:-54349}"
ensure_debian_packages
BASE="$(mktemp -d /tmp/joulebook-dev-pg.XXXXXX)"; chmod 755 "$BASE"
trap 'pg_stop "$BASE"; rm -rf "$BASE"' EXIT INT TERM
pg_start "$BASE" "$PORT" throwaway || exit 1
pg_createdb "$PORT" joulebook_template
export TEST_PG_ADMIN_URL="postgres://postgres@127.0.0.1:$PORT/postgres" TEST_TEMPLATE_DB=joulebook_template
DATABASE_URL="postgres://postgres@127.0.0.1:$PORT/joulebook_template" node --import tsx "$ROOT/scripts/migrate.ts" || exit 1
"$@"

#!/usr/bin/env bash
# Shared set-up steps for `npm run demo` and `npm test`. Sourced, not run.
# Everything here is idempotent: running it twice changes nothing the second time.

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
# The machines have no internet: keep Next from trying to send telemetry.
export NEXT_TELEMETRY_DISABLED=1
PGBIN="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)"

log() { printf '\033[1;33m[joulebook]\033[0m %s\n' "$*" >&2; }
die() { printf '\033[1;31m[joulebook] %s\033[0m\n' "$*" >&2; exit 1; }

as_root() { if [ "$(id -u)" = 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else die "need root to run: $*"; fi; }

# Installs Debian packages that are missing (PostgreSQL always; chromium for browser tests).
ensure_debian_packages() {
  local want=()
  [ -n "$PGBIN" ] && [ -x "$PGBIN/initdb" ] || want+=(postgresql)
  for p in "$@"; do command -v "$p" >/dev/null || want+=("$p"); done
  [ ${#want[@]} -eq 0 ] && return 0
  log "installing Debian packages: ${want[*]}"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${want[@]}" >/dev/null
  PGBIN="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)"
  [ -x "$PGBIN/initdb" ] || die "PostgreSQL did not install (no initdb under /usr/lib/postgresql)"
}

# npm ci when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -f "$ROOT/node_modules/.package-lock.json" ] || [ "$ROOT/package-lock.json" -nt "$ROOT/node_modules/.package-lock.json" ]; then
    log "npm ci"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
  fi
}

# PostgreSQL refuses to run as root: as root the cluster belongs to user postgres.
pg_run() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }

# Picks a cluster folder that user postgres can reach; the checkout may sit under a closed folder.
pg_base_for() {
  local wanted="$1"
  mkdir -p "$wanted"
  if [ "$(id -u)" = 0 ] && ! runuser -u postgres -- test -x "$wanted"; then
    local alt="/var/lib/joulebook/$(printf '%s' "$wanted" | md5sum | cut -c1-12)"
    mkdir -p "$alt"; printf '%s' "$alt"
  else
    printf '%s' "$wanted"
  fi
}

# pg_start BASE PORT [throwaway]: creates the cluster if needed, serves it on 127.0.0.1 only.
pg_start() {
  local base="$1" port="$2" mode="${3:-}" opts
  mkdir -p "$base/sock"
  [ "$(id -u)" = 0 ] && chown -R postgres:postgres "$base"
  if [ ! -f "$base/data/PG_VERSION" ]; then
    log "creating PostgreSQL cluster in $base/data"
    pg_run "$PGBIN/initdb" -D "$base/data" -U postgres --auth=trust --encoding=UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if pg_run "$PGBIN/pg_ctl" -D "$base/data" status >/dev/null 2>&1; then
    log "PostgreSQL already running in $base/data"; return 0
  fi
  opts="-c listen_addresses=127.0.0.1 -p $port -k $base/sock"
  [ "$mode" = throwaway ] && opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"
  pg_run "$PGBIN/pg_ctl" -D "$base/data" -l "$base/log" -w -t 30 -o "$opts" start >/dev/null \
    || { tail -n 20 "$base/log" >&2; die "PostgreSQL did not start (log: $base/log)"; }
  log "PostgreSQL on 127.0.0.1:$port"
}

pg_stop() { pg_run "$PGBIN/pg_ctl" -D "$1/data" -m fast -w stop >/dev/null 2>&1 || true; }

pg_createdb() {
  local port="$1" name="$2"
  if ! pg_run "$PGBIN/psql" -h 127.0.0.1 -p "$port" -U postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    pg_run "$PGBIN/createdb" -h 127.0.0.1 -p "$port" -U postgres "$name"
  fi
}

# Waits until a TCP port on loopback accepts connections.
wait_port() {
  local port="$1" what="$2" i
  for i in $(seq 1 240); do
    (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null && return 0
    sleep 0.5
  done
  die "$what did not open 127.0.0.1:$port"
}

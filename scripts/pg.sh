#!/usr/bin/env bash
# PostgreSQL lifecycle for Ramplight: a private cluster on 127.0.0.1, never the system one.
#   scripts/pg.sh start|stop|status|reset|url
# Settings (environment):
#   RL_PG_PORT   port (default 54329)
#   RL_PG_DIR    data directory (default .data/pg in the repo, or /tmp/ramplight-pg-<hash>
#                when the postgres user cannot reach the repo)
#   RL_PG_DB     database to create (default ramplight)
#   RL_PG_FAST   1 = fsync off (throwaway test clusters only)
set -euo pipefail

repo="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
port="${RL_PG_PORT:-54329}"
db="${RL_PG_DB:-ramplight}"
fast="${RL_PG_FAST:-0}"

find_bindir() {
  local d
  for d in /usr/lib/postgresql/*/bin; do
    [ -x "$d/pg_ctl" ] && { echo "$d"; return 0; }
  done
  return 1
}

ensure_server() {
  if bindir="$(find_bindir)"; then return 0; fi
  if [ "$(id -u)" = 0 ]; then
    echo "PostgreSQL server not found: installing Debian's postgresql package (apt-get)…" >&2
    (apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql) >&2
    # Debian starts its own cluster on 5432; we use our own, so stop that one.
    (service postgresql stop >/dev/null 2>&1 || true)
    bindir="$(find_bindir)" || { echo "PostgreSQL install failed" >&2; exit 1; }
  else
    echo "PostgreSQL server binaries are missing. Install them with:" >&2
    echo "  sudo apt-get update && sudo apt-get install -y postgresql" >&2
    exit 1
  fi
}

# As root, every server command runs as the postgres user (initdb refuses root).
as_pg() {
  if [ "$(id -u)" = 0 ]; then (cd / && runuser -u postgres -- "$@"); else (cd / && "$@"); fi
}

pick_dir() {
  if [ -n "${RL_PG_DIR:-}" ]; then datadir="$RL_PG_DIR"; return; fi
  datadir="$repo/.data/pg"
  if [ "$(id -u)" = 0 ] && ! runuser -u postgres -- test -x "$repo" 2>/dev/null; then
    datadir="/tmp/ramplight-pg-$(printf '%s' "$repo" | sha1sum | cut -c1-10)"
  fi
}

# Running means answering on our port: after a crash the pid file can name a process that is gone
# (or a zombie nobody reaped), which pg_ctl alone would still call running.
is_running() {
  as_pg "$bindir/pg_ctl" -D "$datadir" status >/dev/null 2>&1 && as_pg "$bindir/pg_isready" -q -h 127.0.0.1 -p "$port" -t 3
}

cmd_start() {
  ensure_server; pick_dir
  if [ ! -s "$datadir/PG_VERSION" ]; then
    mkdir -p "$datadir"
    [ "$(id -u)" = 0 ] && chown postgres:postgres "$datadir"
    chmod 700 "$datadir"
    as_pg "$bindir/initdb" -D "$datadir" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if is_running; then
    echo "PostgreSQL already running on 127.0.0.1:$port ($datadir)" >&2
  else
    # A crash leaves a pid file behind; pg_ctl status said no server, so it is stale.
    rm -f "$datadir/postmaster.pid"
    local opts="-c listen_addresses=127.0.0.1 -p $port -c unix_socket_directories=''"
    [ "$fast" = 1 ] && opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"
    as_pg "$bindir/pg_ctl" -D "$datadir" -l "$datadir/server.log" -w -t 30 -o "$opts" start >/dev/null \
      || { echo "PostgreSQL failed to start; log:" >&2; tail -20 "$datadir/server.log" >&2; exit 1; }
    echo "PostgreSQL started on 127.0.0.1:$port ($datadir)" >&2
  fi
  if ! as_pg "$bindir/psql" -h 127.0.0.1 -p "$port" -U postgres -tAc "select 1 from pg_database where datname='$db'" | grep -q 1; then
    as_pg "$bindir/createdb" -h 127.0.0.1 -p "$port" -U postgres "$db"
  fi
}

cmd_stop() {
  ensure_server; pick_dir
  if [ -s "$datadir/PG_VERSION" ] && is_running; then
    as_pg "$bindir/pg_ctl" -D "$datadir" -m fast -w stop >/dev/null && echo "PostgreSQL stopped" >&2
  else
    echo "PostgreSQL not running" >&2
  fi
}

cmd_status() {
  ensure_server; pick_dir
  if [ -s "$datadir/PG_VERSION" ] && is_running; then echo "running on 127.0.0.1:$port ($datadir)"; else echo "stopped ($datadir)"; exit 3; fi
}

cmd_reset() {
  cmd_stop || true
  pick_dir
  rm -rf "$datadir"
  cmd_start
}

case "${1:-}" in
  start) cmd_start ;;
  stop) cmd_stop ;;
  status) cmd_status ;;
  reset) cmd_reset ;;
  url) echo "postgres://postgres@127.0.0.1:$port/$db" ;;
  *) echo "usage: scripts/pg.sh start|stop|status|reset|url" >&2; exit 2 ;;
esac

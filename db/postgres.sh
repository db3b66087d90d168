#!/usr/bin/env bash
# Starts (or stops) a private PostgreSQL cluster on 127.0.0.1 for the demo or the tests.
#   db/postgres.sh start|stop|status  [--data DIR] [--port N] [--db NAME] [--throwaway]
# Idempotent: a running server is reused; a stale postmaster.pid is cleared.
set -euo pipefail

cmd="${1:-start}"; shift || true
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
data="${PG_DATA_DIR:-$root/.data/pg-demo}"
port="${PG_PORT:-55432}"
dbname="${PG_DATABASE:-dutywise}"
throwaway=0
while [ $# -gt 0 ]; do
  case "$1" in
    --data) data="$2"; shift 2 ;;
    --port) port="$2"; shift 2 ;;
    --db) dbname="$2"; shift 2 ;;
    --throwaway) throwaway=1; shift ;;
    *) echo "postgres.sh: unknown option $1" >&2; exit 2 ;;
  esac
done
case "$data" in /*) ;; *) data="$root/$data" ;; esac

find_bin() {
  local d
  for d in $(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V -r); do
    [ -x "$d/pg_ctl" ] && [ -x "$d/initdb" ] && { echo "$d"; return 0; }
  done
  return 1
}

install_server() {
  if [ "$(id -u)" -ne 0 ]; then
    echo "PostgreSQL server binaries are missing and this user is not root." >&2
    echo "Install them with: sudo apt-get install -y postgresql" >&2
    exit 1
  fi
  echo "Installing PostgreSQL from Debian's packages..."
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
}

bin="$(find_bin || true)"
if [ -z "$bin" ]; then
  [ "$cmd" = start ] || { echo "PostgreSQL is not installed"; exit 0; }
  install_server
  bin="$(find_bin)" || { echo "PostgreSQL install did not provide pg_ctl" >&2; exit 1; }
fi

# The server refuses to run as root, so it runs as the unprivileged 'postgres' user.
as_pg() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}
if [ "$(id -u)" -eq 0 ] && ! id postgres >/dev/null 2>&1; then
  useradd --system --home-dir /var/lib/postgresql --shell /usr/sbin/nologin postgres
fi

is_up() { "$bin/pg_isready" -h 127.0.0.1 -p "$port" -q; }

case "$cmd" in
  status)
    if is_up; then echo "PostgreSQL accepting connections on 127.0.0.1:$port"; else echo "PostgreSQL not running on 127.0.0.1:$port"; exit 1; fi
    ;;
  stop)
    if [ -f "$data/PG_VERSION" ]; then as_pg "$bin/pg_ctl" -D "$data" -m fast -w stop >/dev/null 2>&1 || true; fi
    echo "PostgreSQL on port $port stopped"
    ;;
  start)
    mkdir -p "$(dirname "$data")"
    if [ ! -f "$data/PG_VERSION" ]; then
      if [ "$(id -u)" -eq 0 ]; then install -d -o postgres -g postgres -m 700 "$data"; else install -d -m 700 "$data"; fi
      as_pg "$bin/initdb" -D "$data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
    fi
    if ! is_up; then
      # A pid file left by a killed server blocks start-up; remove it only if its process is gone.
      if [ -f "$data/postmaster.pid" ]; then
        pid="$(head -1 "$data/postmaster.pid")"
        if ! kill -0 "$pid" 2>/dev/null; then rm -f "$data/postmaster.pid"; fi
      fi
      opts="-c listen_addresses=127.0.0.1 -c port=$port -c unix_socket_directories=$data -c max_connections=200"
      if [ "$throwaway" -eq 1 ]; then opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"; fi
      as_pg "$bin/pg_ctl" -D "$data" -l "$data/server.log" -w -t 60 -o "$opts" start >/dev/null
    fi
    for _ in $(seq 1 60); do is_up && break; sleep 0.5; done
    is_up || { echo "PostgreSQL did not accept connections; see $data/server.log" >&2; exit 1; }
    exists="$("$bin/psql" -h 127.0.0.1 -p "$port" -U postgres -tAc "select 1 from pg_database where datname='$dbname'")"
    [ "$exists" = 1 ] || "$bin/createdb" -h 127.0.0.1 -p "$port" -U postgres "$dbname"
    echo "PostgreSQL ready: postgres://postgres@127.0.0.1:$port/$dbname"
    ;;
  *) echo "usage: db/postgres.sh start|stop|status [--data DIR] [--port N] [--db NAME] [--throwaway]" >&2; exit 2 ;;
esac

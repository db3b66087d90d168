#!/usr/bin/env bash
# Starts (or stops) a private PostgreSQL cluster on 127.0.0.1 for the demo or the tests.
#   db/postgres.sh start|stop|status|where  [--data DIR] [--port N] [--db NAME] [--throwaway]
# Idempotent: a running server is reused; a stale postmaster.pid is cleared.
#
# Where the cluster lives: run by an ordinary user, the server runs as that user with its files under the
# checkout (DIR, default .data/pg-demo). Run by root, the server runs as the 'postgres' user, which may not be
# able to enter the checkout (a clone below a mode-700 directory such as /root), so the files go to
# /var/lib/postgresql/dutywise/<hash of DIR>-<name of DIR>, owned by postgres, whatever the checkout's path.
#
# Roles: 'postgres' owns the schema and runs migrations (trusted on loopback, for this machine's developer);
# the app signs in as 'dutywise_app' (LOGIN, password PG_APP_PASSWORD, checked with scram-sha-256), which owns
# nothing; the migrations grant it row access only.
set -euo pipefail

cmd="${1:-start}"; shift || true
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
data="${PG_DATA_DIR:-$root/.data/pg-demo}"
port="${PG_PORT:-55432}"
dbname="${PG_DATABASE:-dutywise_demo}"
app_password="${PG_APP_PASSWORD:-dutywise-app-local}"
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
case "$dbname$app_password" in *\'*|*\"*|*\\*) echo "postgres.sh: quotes are not allowed in --db or PG_APP_PASSWORD" >&2; exit 2 ;; esac

if [ "$(id -u)" -eq 0 ]; then
  key="$(printf '%s' "$data" | sha256sum | cut -c1-12)"
  data="/var/lib/postgresql/dutywise/$key-$(basename "$data")"
fi

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

if [ "$cmd" = where ]; then echo "$data"; exit 0; fi

bin="$(find_bin || true)"
if [ -z "$bin" ]; then
  [ "$cmd" = start ] || { echo "PostgreSQL is not installed"; exit 0; }
  install_server
  bin="$(find_bin)" || { echo "PostgreSQL install did not provide pg_ctl" >&2; exit 1; }
fi

# The server refuses to run as root, so under root it runs as the unprivileged 'postgres' user.
as_pg() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}
if [ "$(id -u)" -eq 0 ] && ! id postgres >/dev/null 2>&1; then
  useradd --system --home-dir /var/lib/postgresql --shell /usr/sbin/nologin postgres
fi

is_up() { "$bin/pg_isready" -h 127.0.0.1 -p "$port" -q; }
owner_sql() { "$bin/psql" -h 127.0.0.1 -p "$port" -U postgres -v ON_ERROR_STOP=1 -qtAc "$1" "${2:-postgres}"; }

# Loopback only. The owner is trusted there (this machine's developer runs migrations and tests as it); every
# other role, the app's included, proves its password with scram-sha-256.
write_hba() {
  as_pg tee "$data/pg_hba.conf" >/dev/null <<'HBA'
# Written by db/postgres.sh on every start.
local all postgres                trust
host  all postgres  127.0.0.1/32  trust
host  all postgres  ::1/128       trust
local all all                     scram-sha-256
host  all all       127.0.0.1/32  scram-sha-256
host  all all       ::1/128       scram-sha-256
HBA
}

case "$cmd" in
  status)
    if is_up; then echo "PostgreSQL accepting connections on 127.0.0.1:$port ($data)"; else echo "PostgreSQL not running on 127.0.0.1:$port"; exit 1; fi
    ;;
  stop)
    if [ -f "$data/PG_VERSION" ]; then as_pg "$bin/pg_ctl" -D "$data" -m fast -w stop >/dev/null 2>&1 || true; fi
    echo "PostgreSQL on port $port stopped"
    ;;
  start)
    if [ "$(id -u)" -eq 0 ]; then
      install -d -o postgres -g postgres -m 755 /var/lib/postgresql
      install -d -o postgres -g postgres -m 700 /var/lib/postgresql/dutywise
    else
      mkdir -p "$(dirname "$data")"
    fi
    if [ ! -f "$data/PG_VERSION" ]; then
      if [ "$(id -u)" -eq 0 ]; then install -d -o postgres -g postgres -m 700 "$data"; else install -d -m 700 "$data"; fi
      as_pg "$bin/initdb" -D "$data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
    fi
    write_hba
    if [ -f "$data/postmaster.pid" ] && is_up; then
      as_pg "$bin/pg_ctl" -D "$data" reload >/dev/null
    else
      # A pid file left by a killed server blocks start-up; remove it only if its process is gone.
      if [ -f "$data/postmaster.pid" ]; then
        pid="$(head -1 "$data/postmaster.pid")"
        if ! kill -0 "$pid" 2>/dev/null; then rm -f "$data/postmaster.pid"; fi
      fi
      opts="-c listen_addresses=127.0.0.1 -c port=$port -c unix_socket_directories=$data -c max_connections=200"
      opts="$opts -c password_encryption=scram-sha-256"
      if [ "$throwaway" -eq 1 ]; then opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"; fi
      as_pg "$bin/pg_ctl" -D "$data" -l "$data/server.log" -w -t 60 -o "$opts" start >/dev/null
    fi
    for _ in $(seq 1 60); do is_up && break; sleep 0.5; done
    is_up || { echo "PostgreSQL did not accept connections; see $data/server.log" >&2; exit 1; }
    owner_sql "do \$\$ begin
      if not exists (select from pg_roles where rolname = 'dutywise_app') then create role dutywise_app; end if;
      alter role dutywise_app login nosuperuser nocreatedb nocreaterole password '$app_password';
    end \$\$"
    exists="$(owner_sql "select 1 from pg_database where datname='$dbname'")"
    [ "$exists" = 1 ] || "$bin/createdb" -h 127.0.0.1 -p "$port" -U postgres "$dbname"
    echo "PostgreSQL ready: postgres://postgres@127.0.0.1:$port/$dbname (app role dutywise_app; files in $data)"
    ;;
  *) echo "usage: db/postgres.sh start|stop|status|where [--data DIR] [--port N] [--db NAME] [--throwaway]" >&2; exit 2 ;;
esac

#!/usr/bin/env bash
# `npm run bench`: the speed and memory targets, measured on this machine. Loopback only, bounded in time.
# Uses its own databases on the test cluster (port 55433 + TEST_PORT_OFFSET): dutywise_bench holds the demo
# scenario plus a million generated sizings; the look-up is also timed on dutywise_bench_100k and
# dutywise_bench_5m (BENCH_SIZES to choose). Each is generated once and kept; the first run takes a while.
# BENCH_SKIP_LOAD=1 leaves out the HTTP load run; BENCH_REUSE_BUILD=1 keeps an existing production build.
# Then Debian's Chromium drives the desk (BENCH_SKIP_BROWSER=1 leaves it out), and the soak run ends it
# (SOAK_SECONDS, default 600; BENCH_SKIP_SOAK=1 leaves it out). BENCH_ONLY=browser or BENCH_ONLY=soak runs just that
# section and keeps the other sections of RESULTS.md (no look-up data is generated).
set -uo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
export NEXT_TELEMETRY_DISABLED=1
mkdir -p .data # the sections' server logs; the clusters live where db/postgres.sh puts them
[ -f node_modules/.package-lock.json ] || npm ci --no-audit --no-fund
offset="${TEST_PORT_OFFSET:-0}"
export PG_DATA_DIR="$PWD/.data/pg-test" PG_PORT=$((55433 + offset))
bash db/postgres.sh start --throwaway --db dutywise_bench || exit 1
# Migrations, data generation and ANALYZE run as the owner; the app under load signs in as dutywise_app.
owner_url() { echo "postgres://postgres@127.0.0.1:$PG_PORT/$1"; }
app_url() { echo "postgres://dutywise_app:${PG_APP_PASSWORD:-dutywise-app-local}@127.0.0.1:$PG_PORT/$1"; }
export MIGRATION_DATABASE_URL="$(owner_url dutywise_bench)"
export DATABASE_URL="$(app_url dutywise_bench)"
only="${BENCH_ONLY:-}"
case "$only" in '' | browser | soak) ;; *) echo "BENCH_ONLY is browser or soak (got $only)" >&2; exit 2 ;; esac
[ -n "$only" ] || rm -f tests/bench/RESULTS.md
node_script() { npx tsx --require ./db/script-preload.cjs "$@"; }
fail=0
built=0
# One production build per run, shared by the HTTP load, browser and soak sections.
build_app() {
  export NEXT_DIST_DIR=.next-bench
  [ "$built" = 1 ] && return 0
  if [ "${BENCH_REUSE_BUILD:-0}" != 1 ] || [ ! -f .next-bench/BUILD_ID ]; then npx next build || exit 1; fi
  built=1
}
wait_healthy() { for _ in $(seq 1 60); do curl -fs "http://127.0.0.1:$1/api/health" >/dev/null 2>&1 && break; sleep 1; done; }
npx tsx db/migrate.mts || exit 1
node_script db/seed.ts || exit 1

if [ -z "$only" ]; then

engine_out="$(mktemp)"
echo "== engine (one core)";         npx tsx tests/bench/engine.bench.mts | tee "$engine_out" || fail=1
# The deployment's per-hour budgets would stop a timed series of issues and uploads after 30 and 20: lifted here.
echo "== datasheets";                RATE_LIMIT_DATASHEETS_PER_HOUR=1000000 node_script tests/bench/datasheet.bench.ts || fail=1
echo "== batch";                     RATE_LIMIT_BATCH_PER_HOUR=1000000 node_script tests/bench/batch.bench.ts || fail=1

for rows in ${BENCH_SIZES:-100000 1000000 5000000}; do
  case "$rows" in 1000000) name=dutywise_bench ;; *000000) name="dutywise_bench_$((rows / 1000000))m" ;; *) name="dutywise_bench_$((rows / 1000))k" ;; esac
  echo "== look-up data: $rows sizings in $name (generated once; millions take minutes)"
  psql -h 127.0.0.1 -p "$PG_PORT" -U postgres -tAc "select 1 from pg_database where datname = '$name'" postgres | grep -q 1 ||
    psql -h 127.0.0.1 -p "$PG_PORT" -U postgres -qc "create database $name" postgres || { fail=1; continue; }
  MIGRATION_DATABASE_URL="$(owner_url "$name")" npx tsx db/migrate.mts || { fail=1; continue; }
  DATABASE_URL="$(owner_url "$name")" node_script tests/bench/generate-sizings.ts "$rows" || { fail=1; continue; }
  echo "== look-up on $rows sizings"
  DATABASE_URL="$(app_url "$name")" node_script tests/bench/search.bench.ts || fail=1
done

if [ "${BENCH_SKIP_LOAD:-0}" != 1 ]; then
  echo "== HTTP load (production builds of Dutywise and of the minimal floor app)"
  build_app
  echo "== first-load JavaScript per page"
  node_script tests/bench/bundle.bench.ts || fail=1
  (unset NEXT_DIST_DIR; npx next build tests/bench/floor-app) > .data/bench-floor-build.log 2>&1 || { cat .data/bench-floor-build.log; exit 1; }
  app_port=$((3200 + offset)) floor_port=$((3300 + offset))
  # node itself, not an npx wrapper, so the pid is the server's (its CPU is read from /proc) and the kill reaches it
  # lib/server/serve.mjs, as in production (plain `next start` is refused there); demo mode accepts the local defaults
  DEMO_MODE=on RATE_LIMIT_CALCULATE_PER_MIN=100000000 LOG_LEVEL=warn node lib/server/serve.mjs --port "$app_port" > .data/bench-app.log 2>&1 &
  app_pid=$!
  env -u NEXT_DIST_DIR node node_modules/next/dist/bin/next start tests/bench/floor-app -p "$floor_port" \
    --keepAliveTimeout 120000 > .data/bench-floor.log 2>&1 &
  floor_pid=$!
  wait_healthy "$app_port"
  BENCH_APP_URL="http://127.0.0.1:$app_port" BENCH_FLOOR_URL="http://127.0.0.1:$floor_port" \
    BENCH_APP_PID=$app_pid BENCH_FLOOR_PID=$floor_pid node_script tests/bench/load.bench.ts || fail=1
  kill "$app_pid" "$floor_pid" 2>/dev/null
fi
{ echo; echo "## Sizing engine (one core)"; echo; echo '```'; cat "$engine_out"; echo '```'; } >> tests/bench/RESULTS.md
rm -f "$engine_out"
fi

if [ "$only" != soak ] && [ "${BENCH_SKIP_BROWSER:-0}" != 1 ]; then
  echo "== the desk in a browser (Debian's Chromium, production build, a visitor on loopback)"
  build_app
  browser_port=$((3205 + offset))
  # A fresh server with the deployment's own limits; APP_URL is the address the browser uses.
  APP_URL="http://127.0.0.1:$browser_port" DEMO_MODE=on LOG_LEVEL=warn node lib/server/serve.mjs --port "$browser_port" \
    > .data/bench-browser.log 2>&1 &
  browser_pid=$!
  wait_healthy "$browser_port"
  BENCH_APP_URL="http://127.0.0.1:$browser_port" node_script tests/bench/browser.bench.ts || fail=1
  kill "$browser_pid" 2>/dev/null
fi

if [ "$only" != browser ] && [ "${BENCH_SKIP_SOAK:-0}" != 1 ]; then
  echo "== soak: mixed office load for ${SOAK_SECONDS:-600} s (production build, default limits)"
  # The build the other sections made, or the last one when the soak runs alone.
  if [ -f .next-bench/BUILD_ID ]; then export NEXT_DIST_DIR=.next-bench; else build_app; fi
  soak=$((3250 + offset))
  # A fresh server with the deployment's own limits, so memory and connections are the soak's alone.
  DEMO_MODE=on LOG_LEVEL=warn node lib/server/serve.mjs --port "$soak" > .data/bench-soak.log 2>&1 &
  soak_pid=$!
  wait_healthy "$soak"
  BENCH_APP_URL="http://127.0.0.1:$soak" BENCH_APP_PID=$soak_pid node_script tests/bench/soak.bench.ts || fail=1
  kill "$soak_pid" 2>/dev/null
fi
echo; cat tests/bench/RESULTS.md
exit "$fail"

#!/usr/bin/env bash
# `npm run bench`: the speed and memory targets, measured on this machine. Loopback only, bounded in time.
# Uses its own database (dutywise_bench on the test cluster, port 55433), filled once with a million sizings.
set -uo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
export NEXT_TELEMETRY_DISABLED=1
[ -f node_modules/.package-lock.json ] || npm ci --no-audit --no-fund
export PG_DATA_DIR="$PWD/.data/pg-test" PG_PORT=55433
bash db/postgres.sh start --throwaway --db dutywise_bench || exit 1
export MIGRATION_DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/dutywise_bench"
export DATABASE_URL="postgres://dutywise_app:${PG_APP_PASSWORD:-dutywise-app-local}@127.0.0.1:$PG_PORT/dutywise_bench"
rm -f tests/bench/RESULTS.md
node_script() { npx tsx --require ./db/script-preload.cjs "$@"; }
fail=0
npx tsx db/migrate.mts || exit 1
node_script db/seed.ts || exit 1

engine_out="$(mktemp)"
echo "== engine (one core)";         npx tsx tests/bench/engine.bench.mts | tee "$engine_out" || fail=1
echo "== datasheets";                node_script tests/bench/datasheet.bench.ts || fail=1
echo "== batch";                     node_script tests/bench/batch.bench.ts || fail=1
echo "== data for search (${BENCH_ROWS:-1000000} rows; first run takes a few minutes)"
DATABASE_URL="$MIGRATION_DATABASE_URL" node_script tests/bench/generate-sizings.ts "${BENCH_ROWS:-1000000}" || fail=1 # analyze needs the owner
echo "== search";                    node_script tests/bench/search.bench.ts || fail=1

if [ "${BENCH_SKIP_LOAD:-0}" != 1 ]; then
  echo "== HTTP load (production build)"
  export NEXT_DIST_DIR=.next-bench
  [ -f .next-bench/BUILD_ID ] || npx next build || exit 1
  pids=()
  DEMO_MODE=on RATE_LIMIT_CALCULATE_PER_MIN=100000000 LOG_LEVEL=warn node server.mjs --port 3200 > .data/bench-app.log 2>&1 & pids+=($!)
  # node itself, not an npx/tsx wrapper, so the kill below reaches the server
  node --import tsx tests/bench/bare-server.ts 3299 > .data/bench-bare.log 2>&1 & pids+=($!)
  for _ in $(seq 1 60); do curl -fs http://localhost:3200/api/health >/dev/null 2>&1 && break; sleep 1; done
  npx tsx tests/bench/load.bench.ts || fail=1
  for p in "${pids[@]}"; do kill "$p" 2>/dev/null; done
fi
{ echo; echo "## Sizing engine (one core)"; echo; echo '```'; cat "$engine_out"; echo '```'; } >> tests/bench/RESULTS.md
rm -f "$engine_out"
echo; cat tests/bench/RESULTS.md
exit "$fail"

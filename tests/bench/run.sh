#!/usr/bin/env bash
# `npm run bench`: the speed and memory targets, measured on this machine. Loopback only, bounded in time.
# Uses its own database (dutywise_bench on the test cluster, port 55433), filled once with a million sizings.
# Ends with the soak run (SOAK_SECONDS, default 600). BENCH_ONLY=soak runs just the soak and keeps the other
# sections of RESULTS.md; BENCH_SKIP_SOAK=1 leaves it out. TEST_PORT_OFFSET shifts the ports as for the tests.
set -uo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
export NEXT_TELEMETRY_DISABLED=1
[ -f node_modules/.package-lock.json ] || npm ci --no-audit --no-fund
off="${TEST_PORT_OFFSET:-0}"
only="${BENCH_ONLY:-}"
export PG_DATA_DIR="$PWD/.data/pg-test" PG_PORT=$((55433 + off))
bash db/postgres.sh start --throwaway --db dutywise_bench || exit 1
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_PORT/dutywise_bench"
[ "$only" = soak ] || rm -f tests/bench/RESULTS.md
node_script() { npx tsx --require ./db/script-preload.cjs "$@"; }
fail=0
npx tsx db/migrate.mts || exit 1
node_script db/seed.ts || exit 1

export NEXT_DIST_DIR=.next-bench
build_if_stale() {
  # Rebuild when a tracked source is newer than the last build, so the servers run the code being measured.
  if [ ! -f .next-bench/BUILD_ID ] || [ -n "$(git ls-files -z 2>/dev/null | xargs -0 -I{} find {} -newer .next-bench/BUILD_ID -print -quit 2>/dev/null | head -1)" ]; then
    npx next build || exit 1
  fi
}

if [ "$only" != soak ]; then

engine_out="$(mktemp)"
echo "== engine (one core)";         npx tsx tests/bench/engine.bench.mts | tee "$engine_out" || fail=1
echo "== datasheets";                node_script tests/bench/datasheet.bench.ts || fail=1
echo "== batch";                     node_script tests/bench/batch.bench.ts || fail=1
echo "== data for search (${BENCH_ROWS:-1000000} rows; first run takes a few minutes)"
node_script tests/bench/generate-sizings.ts "${BENCH_ROWS:-1000000}" || fail=1
echo "== search";                    node_script tests/bench/search.bench.ts || fail=1

if [ "${BENCH_SKIP_LOAD:-0}" != 1 ]; then
  echo "== HTTP load (production build)"
  build_if_stale
  app=$((3200 + off)) bare=$((3299 + off))
  pids=()
  RATE_LIMIT_CALCULATE_PER_MIN=100000000 LOG_LEVEL=warn node node_modules/next/dist/bin/next start -p $app > .data/bench-app.log 2>&1 & pids+=($!)
  # node itself, not an npx/tsx wrapper, so the kill below reaches the server
  node --import tsx tests/bench/bare-server.ts $bare > .data/bench-bare.log 2>&1 & pids+=($!)
  for _ in $(seq 1 60); do curl -fs http://localhost:$app/api/health >/dev/null 2>&1 && break; sleep 1; done
  BENCH_APP_URL=http://localhost:$app BENCH_BARE_URL=http://127.0.0.1:$bare npx tsx tests/bench/load.bench.ts || fail=1
  for p in "${pids[@]}"; do kill "$p" 2>/dev/null; done
fi
{ echo; echo "## Sizing engine (one core)"; echo; echo '```'; cat "$engine_out"; echo '```'; } >> tests/bench/RESULTS.md
rm -f "$engine_out"
fi

if [ "${BENCH_SKIP_SOAK:-0}" != 1 ]; then
  echo "== soak: mixed office load for ${SOAK_SECONDS:-600} s (production build, default limits)"
  build_if_stale
  soak=$((3250 + off))
  # A fresh server with the deployment's own limits, so memory and connections are the soak's alone.
  LOG_LEVEL=warn node node_modules/next/dist/bin/next start -p $soak > .data/bench-soak.log 2>&1 &
  soak_pid=$!
  for _ in $(seq 1 60); do curl -fs http://localhost:$soak/api/health >/dev/null 2>&1 && break; sleep 1; done
  BENCH_APP_URL=http://localhost:$soak BENCH_APP_PID=$soak_pid node_script tests/bench/soak.bench.ts || fail=1
  kill "$soak_pid" 2>/dev/null
fi
echo; cat tests/bench/RESULTS.md
exit "$fail"

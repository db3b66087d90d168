#!/usr/bin/env bash
# `npm run demo`: everything a fresh machine needs to show Dutywise with its invented demo scenario.
# Installs dependencies when missing, starts PostgreSQL (port 55432), migrates, seeds once, starts the
# local Stripe and SMTP fakes and the job worker, builds when sources changed, serves on :3000, then brings the
# demo's subscriptions and the Stripe fake's saved state into agreement (on every start).
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export NEXT_TELEMETRY_DISABLED=1 NEXT_PUBLIC_CLERK_TELEMETRY_DISABLED=1
# The app connects as dutywise_app (owns nothing); migrations run as the schema's owner.
export DATABASE_URL="${DATABASE_URL:-postgres://dutywise_app:${PG_APP_PASSWORD:-dutywise-app-local}@127.0.0.1:55432/dutywise_demo}"
export MIGRATION_DATABASE_URL="${MIGRATION_DATABASE_URL:-postgres://postgres@127.0.0.1:55432/dutywise_demo}"
export MAIL_FAKE_INBOX_URL="${MAIL_FAKE_INBOX_URL:-http://127.0.0.1:12026}"
# Demo mode: the invented scenario's sign-ins are shown and the local fakes are allowed under the production build.
export DEMO_MODE=on
port="${PORT:-3000}"

# Reinstall only when the lock file's content changed since the last install.
lock_hash="$(sha256sum package-lock.json | cut -d' ' -f1)"
if [ ! -f node_modules/.package-lock.json ] || [ "$(cat node_modules/.dutywise-lock-hash 2>/dev/null)" != "$lock_hash" ]; then
  echo "Installing dependencies (npm ci)..."
  npm ci --no-audit --no-fund
  echo "$lock_hash" > node_modules/.dutywise-lock-hash
fi

# db/postgres.sh keeps the cluster where its server user can reach it, wherever this checkout lives.
PG_DATA_DIR="$PWD/.data/pg-demo" PG_PORT=55432 bash db/postgres.sh start --db dutywise_demo
npx tsx db/migrate.mts
npx tsx --require ./db/script-preload.cjs db/seed.ts

# Each background process is node itself (not an npx wrapper), so stopping the demo stops it.
pids=()
cleanup() { for p in "${pids[@]}"; do kill "$p" 2>/dev/null || true; done; wait 2>/dev/null || true; }
trap cleanup EXIT INT TERM

mkdir -p .data
STRIPE_FAKE_STATE="$PWD/.data/stripe-fake.json" STRIPE_WEBHOOK_URL="http://localhost:$port/api/webhooks/stripe" \
  node --import tsx mocks/start-fakes.mts > .data/fakes.log 2>&1 &
pids+=($!)

# Rebuild only when a tracked source is newer than the last build.
if [ ! -f .next/BUILD_ID ] || [ -n "$(git ls-files -z 2>/dev/null | xargs -0 -I{} find {} -newer .next/BUILD_ID -print -quit 2>/dev/null | head -1)" ]; then
  echo "Building the app (about a minute)..."
  npx next build
fi

# The job worker runs every background job: it sends the mail the app queues (retrying while SMTP is
# down) and sweeps orphaned blobs.
node --require ./db/script-preload.cjs --import tsx lib/jobs/worker.mts > .data/job-worker.log 2>&1 &
pids+=($!)

node lib/server/serve.mjs --port "$port" &
pids+=($!)

for _ in $(seq 1 60); do curl -fs "http://localhost:$port/api/health" >/dev/null 2>&1 && break; sleep 1; done

# The fake keeps its customers and subscriptions in .data/stripe-fake.json; the database follows it on every start,
# and the scenario's subscription accounts get their states where they have none (a fresh clone, a removed state
# file). Run once the app is up, so the fake's events (the failed renewal's e-mail) reach its webhook.
for _ in $(seq 1 30); do curl -fs http://127.0.0.1:12111/_control/health >/dev/null 2>&1 && break; sleep 1; done
npx tsx --require ./db/script-preload.cjs db/seed-billing.ts
cat <<MSG

  Dutywise is running at http://localhost:$port
  Health:            http://localhost:$port/api/health
  Fake mail inbox:   $MAIL_FAKE_INBOX_URL
  Fake payments:     http://localhost:12111 (test card 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is declined)

  Demo sign-ins (password for all: dutywise-demo):
$(npx tsx -e "import('./lib/auth/demo-users.ts').then(m=>(m.demoSignIns ?? m.default.demoSignIns).forEach(u=>console.log('    '+u.label.padEnd(52)+u.email)))")

  Press Ctrl-C to stop (PostgreSQL keeps running; stop it with npm run db:stop).
MSG
wait "${pids[-1]}"

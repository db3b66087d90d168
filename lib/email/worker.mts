// The mail worker: drains the outbox every few seconds and at once when a commit NOTIFYs.
// Run: npx tsx --require ./db/script-preload.cjs lib/email/worker.mts [--interval-ms 2000] [--limit 20] [--once] [--only-to '%@example.com']
// Several may run against one database (one per app instance); SKIP LOCKED keeps their claims apart.
import '../../db/script-preload.cjs';
import { hostname } from 'node:os';
import { parseArgs } from 'node:util';
import type { PoolClient } from 'pg';
import { pool } from '@/db';
import { logger } from '@/lib/log/logger';
import { drainOutbox } from './drain';
import { sweepOrphanBlobs } from '@/lib/blob';
import { env } from '@/lib/env';
import { sweepExpiredSessions } from '@/lib/auth/local/session-store';
import { purgeExpiredCounters } from '@/lib/ratelimit/store';
import { refuseUnsafeStart } from '@/lib/security/start-check';
import { outboxChannel } from './enqueue';

const { values } = parseArgs({
  options: {
    'interval-ms': { type: 'string', default: '2000' },
    limit: { type: 'string', default: '20' },
    once: { type: 'boolean', default: false },
    'only-to': { type: 'string' },
  },
});
const intervalMs = Number(values['interval-ms']);
const limit = Number(values.limit);
if (!Number.isInteger(intervalMs) || intervalMs < 100 || intervalMs > 600_000)
  throw new Error(
    `--interval-ms must be a whole number of milliseconds from 100 to 600000 (got ${values['interval-ms']})`,
  );
if (!Number.isInteger(limit) || limit < 1 || limit > 500)
  throw new Error(`--limit must be a whole number from 1 to 500 (got ${values.limit})`);

// A LIKE pattern on recipients: tests that share a database run workers over their own mail only.
const toAddressLike = values['only-to'] || undefined;
const workerId = `${hostname()}-${process.pid}`;
const log = logger.child({ component: 'mail-worker', workerId });
let stopping = false;
let notified = false;
let wake: (() => void) | null = null;
let listener: PoolClient | null = null;

function nap(ms: number): Promise<void> {
  if (notified || stopping) return Promise.resolve();
  return new Promise((resolve) => {
    const timer = setTimeout(done, ms);
    function done() {
      clearTimeout(timer);
      wake = null;
      resolve();
    }
    wake = done;
  });
}

function nudge() {
  notified = true;
  wake?.();
}

// LISTEN is a shortcut, not a dependency: without it the poll still delivers every message.
async function listen(): Promise<PoolClient | null> {
  try {
    const client = await pool.connect();
    client.on('notification', nudge);
    client.on('error', (err) => {
      log.warn({ err: err.message }, 'listen connection lost; polling until it is back');
      client.release(err);
      if (listener === client) listener = null;
    });
    await client.query(`listen ${outboxChannel}`);
    return client;
  } catch (err) {
    log.warn({ err: err instanceof Error ? err.message : String(err) }, 'cannot listen for new mail; polling only');
    return null;
  }
}

function stop(signal: string) {
  if (stopping) return;
  log.info({ signal }, 'stopping after the current pass');
  stopping = true;
  wake?.();
}
process.on('SIGTERM', () => stop('SIGTERM'));
process.on('SIGINT', () => stop('SIGINT'));

// The worker also removes datasheet and upload objects a crashed issue left in an S3 bucket (the
// PostgreSQL store is transactional and leaves none); every ten minutes is plenty.
const SWEEP_EVERY_MS = 10 * 60_000;
let lastSweep = 0;
async function sweepIfDue() {
  if (env.BLOB_STORE !== 's3' || Date.now() - lastSweep < SWEEP_EVERY_MS) return;
  lastSweep = Date.now();
  const report = await sweepOrphanBlobs().catch((err: unknown) => log.warn({ err: String(err) }, 'blob sweep failed'));
  if (report && report.deleted.length) log.info({ deleted: report.deleted.length }, 'orphan blobs removed');
}

// Expired sign-in sessions and rate-limit counters are deleted on the same schedule (each sign-in also clears its
// own user's sessions; each app instance's limiter sweeps counters too).
let lastSessionSweep = 0;
async function sweepSessionsIfDue() {
  if (Date.now() - lastSessionSweep < SWEEP_EVERY_MS) return;
  lastSessionSweep = Date.now();
  await sweepExpiredSessions().catch((err: unknown) => log.warn({ err: String(err) }, 'session sweep failed'));
  await purgeExpiredCounters().catch((err: unknown) => log.warn({ err: String(err) }, 'rate counter sweep failed'));
}

await refuseUnsafeStart({ server: false });
log.info({ intervalMs, limit, toAddressLike }, 'mail worker started');
while (!stopping) {
  await sweepIfDue();
  await sweepSessionsIfDue();
  notified = false;
  let full = false;
  try {
    const result = await drainOutbox({ limit, workerId, toAddressLike });
    full = result.claimed === limit;
  } catch (err) {
    // Database down or similar: keep the process, try again next pass.
    log.error({ err: err instanceof Error ? err.message : String(err) }, 'outbox pass failed');
  }
  if (values.once) break;
  listener ??= await listen();
  if (!full) await nap(intervalMs);
}
listener?.release();
await pool.end();
log.info('mail worker stopped');

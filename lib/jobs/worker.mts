// The one worker for every background job (mail, the blob sweeper, and whatever lib/jobs/queues.ts lists).
// Run: node --require ./db/script-preload.cjs --import tsx lib/jobs/worker.mts [--interval-ms 2000] [--concurrency 4]
// Several may run against one database (one per app instance): pg-boss hands each job to one of them.
import '../../db/script-preload.cjs';
import { hostname } from 'node:os';
import { parseArgs } from 'node:util';
import type PgBoss from 'pg-boss';
import { pool } from '@/db';
import { env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { refuseUnsafeStart } from '@/lib/security/start-check';
import { getBoss } from './boss';
import { handlers } from './handlers';
import { installQueues, MAIL_QUEUE, queues } from './queues';

const { values } = parseArgs({
  options: {
    'interval-ms': { type: 'string', default: '2000' },
    concurrency: { type: 'string', default: '4' },
  },
});
const intervalMs = Number(values['interval-ms']);
const concurrency = Number(values.concurrency);
// pg-boss polls no more often than every 500 ms.
if (!Number.isInteger(intervalMs) || intervalMs < 500 || intervalMs > 600_000)
  throw new Error(
    `--interval-ms must be a whole number of milliseconds from 500 to 600000 (got ${values['interval-ms']})`,
  );
if (!Number.isInteger(concurrency) || concurrency < 1 || concurrency > 50)
  throw new Error(`--concurrency must be a whole number from 1 to 50 (got ${values.concurrency})`);

const log = logger.child({ component: 'job-worker', workerId: `${hostname()}-${process.pid}` });
const boss = getBoss();
// Maintenance and polling problems (the database restarting) are reported here; the worker carries on.
boss.on('error', (err: Error) => log.warn({ err: err.message }, 'job queue error; retrying'));
// pg-boss records a job's outcome without awaiting it; a database outage there must not end the process
// (the job simply expires and is retried).
process.on('unhandledRejection', (err) => log.warn({ err: String(err) }, 'job outcome not recorded; it will expire'));

async function runLoop(queue: string) {
  const handle = handlers[queue];
  if (!handle) throw new Error(`no handler for queue ${queue}`);
  let workerId = '';
  workerId = await boss.work(
    queue,
    { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: intervalMs / 1000 },
    async ([job]: PgBoss.JobWithMetadata[]) => {
      try {
        return job ? await handle(job) : undefined;
      } finally {
        // A job was there: look for the next at once instead of after the polling interval.
        boss.notifyWorker(workerId);
      }
    },
  );
}

await refuseUnsafeStart({ server: false });
await boss.start();
await installQueues(boss);
for (const q of queues) {
  if (q.cron) await boss.schedule(q.name, q.cron);
  const loops = q.name === MAIL_QUEUE ? concurrency : 1;
  for (let i = 0; i < loops; i++) await runLoop(q.name);
}
log.info({ intervalMs, concurrency, schema: env.JOBS_SCHEMA }, 'job worker started');

let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  log.info({ signal }, 'stopping after the jobs in hand');
  await boss.stop({ graceful: true, wait: true, timeout: 30_000 });
  await pool.end();
  log.info('job worker stopped');
  process.exit(0);
}
process.on('SIGTERM', () => void stop('SIGTERM'));
process.on('SIGINT', () => void stop('SIGINT'));

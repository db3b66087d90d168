import 'server-only';
import type PgBoss from 'pg-boss';
import { sweepOrphanBlobs } from '@/lib/blob';
import { buryEmail, deliverEmail } from '@/lib/email/deliver';
import { env } from '@/lib/env';
import { sweepExpiredSessions } from '@/lib/auth/local/session-store';
import { purgeExpiredCounters } from '@/lib/ratelimit/store';
import { BLOB_SWEEP_QUEUE, MAIL_DEAD_QUEUE, MAIL_QUEUE, SESSION_SWEEP_QUEUE } from './queues';

export type JobHandler = (job: PgBoss.JobWithMetadata) => Promise<unknown>;

function outboxIdOf(job: PgBoss.JobWithMetadata): string {
  const id = (job.data as { outboxId?: unknown } | null)?.outboxId;
  if (typeof id !== 'string') throw new Error(`job ${job.id} on ${job.name} has no outboxId`);
  return id;
}

/**
 * What the worker does with a job of each queue; the work itself lives with its concern. A handler that
 * throws fails the attempt: pg-boss retries it with the queue's back-off, then dead-letters it.
 */
export const handlers: Record<string, JobHandler> = {
  [MAIL_QUEUE]: (job) =>
    deliverEmail(outboxIdOf(job), { number: job.retryCount + 1, last: job.retryCount >= job.retryLimit }),
  [MAIL_DEAD_QUEUE]: (job) => buryEmail(outboxIdOf(job)),
  // The PostgreSQL store writes blobs in the issuing transaction and leaves no orphans to sweep.
  [BLOB_SWEEP_QUEUE]: async () => (env.BLOB_STORE === 's3' ? sweepOrphanBlobs() : { skipped: 'postgres store' }),
  [SESSION_SWEEP_QUEUE]: async () => ({
    sessions: await sweepExpiredSessions(),
    counters: await purgeExpiredCounters(),
  }),
};

// Every background job's queue, with its retry policy. Pure data plus the install step, so the
// migration script (plain Node) can create them too. Run by lib/jobs/worker.mts; see DEVELOPERS.md.
import type PgBoss from 'pg-boss';

/** pg-boss keeps its tables in this schema unless JOBS_SCHEMA names another (tests use one per file). */
export const DEFAULT_JOBS_SCHEMA = 'pgboss';

/** pg-boss 10's internal queue that turns cron schedules into jobs (timekeeper.js, QUEUES.SEND_IT). */
const CRON_QUEUE = '__pgboss__send-it';

export type QueueSpec = {
  name: string;
  options: Omit<PgBoss.Queue, 'name'>;
  /** Cron expression (UTC) for jobs the worker starts on a timetable rather than on a cause. */
  cron?: string;
};

/**
 * Outgoing mail. pg-boss retries a failed send after retryDelay * 2^n * (1 + jitter) seconds
 * (15-30 s, 30-60 s, ... ; its back-off has no cap in this major version), so nine retries ride out
 * an SMTP outage of two to four hours [cp: this queue's schedule]. A send that has not reported back
 * after 60 s counts as failed (a worker that died mid-send); the last failure goes to the dead letters.
 */
export const MAIL_QUEUE = 'mail';
/** Mail whose last allowed attempt failed or never reported back: the worker records it as given up. */
export const MAIL_DEAD_QUEUE = 'mail-dead';
/** Removes blob-store objects a crashed datasheet issue left behind (S3 only; PostgreSQL is transactional). */
export const BLOB_SWEEP_QUEUE = 'blob-sweep';
/** Deletes expired sign-in sessions and rate-limit counters (each app instance's limiter also sweeps its own). */
export const SESSION_SWEEP_QUEUE = 'session-sweep';

export const queues: readonly QueueSpec[] = [
  { name: MAIL_DEAD_QUEUE, options: { retryLimit: 5, retryDelay: 30, retryBackoff: true } },
  {
    name: MAIL_QUEUE,
    options: {
      retryLimit: 9,
      retryDelay: 15,
      retryBackoff: true,
      expireInSeconds: 60,
      deadLetter: MAIL_DEAD_QUEUE,
    },
  },
  // Every ten minutes is plenty for leftovers of a rare crash; a missed run is simply the next one.
  { name: BLOB_SWEEP_QUEUE, options: { retryLimit: 0, expireInSeconds: 600 }, cron: '*/10 * * * *' },
  { name: SESSION_SWEEP_QUEUE, options: { retryLimit: 0, expireInSeconds: 600 }, cron: '*/10 * * * *' },
];

/** Creates every queue, or brings an existing one's retry policy up to date. Safe to run again. */
export async function installQueues(boss: PgBoss): Promise<void> {
  // pg-boss's own queue for cron schedules; its worker creates it on start, which the app role (dutywise_app, no
  // CREATE in the jobs schema) cannot do, so the owner installs it here with the others.
  await boss.createQueue(CRON_QUEUE);
  for (const q of queues) {
    await boss.createQueue(q.name, { name: q.name, ...q.options });
    await boss.updateQueue(q.name, { name: q.name, ...q.options });
  }
}

/**
 * The app role (dutywise_app, which owns nothing) may read and write the queue tables the owner installed,
 * those of queues created later included, and nothing more: pg-boss's schema stays the owner's.
 */
export function grantJobsSchemaSql(schema: string): string {
  const s = `"${schema.replace(/"/g, '""')}"`;
  return `DO $$ BEGIN
  IF EXISTS (SELECT FROM pg_roles WHERE rolname = 'dutywise_app') THEN
    GRANT USAGE ON SCHEMA ${s} TO dutywise_app;
    GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA ${s} TO dutywise_app;
    GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA ${s} TO dutywise_app;
    ALTER DEFAULT PRIVILEGES IN SCHEMA ${s} GRANT SELECT, INSERT, UPDATE, DELETE ON TABLES TO dutywise_app;
  END IF;
END $$;`;
}

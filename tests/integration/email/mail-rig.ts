import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import pg from 'pg';
import PgBoss from 'pg-boss';
import { vi } from 'vitest';
import { startSmtpFake, type SmtpFakeHandle, type StoredMessage } from '@/mocks/smtp/server';
import type { EmailProps } from '@/lib/email/catalogue';

// Each test file gets its own SMTP fake on free ports, its own recipient domain and its own pg-boss schema,
// so files can share the test database in parallel without taking each other's jobs.
export type MailRig = Awaited<ReturnType<typeof startMailRig>>;
export type DrainResult = { claimed: number; sent: number; retried: number; dead: number };

export async function startMailRig() {
  const fake: SmtpFakeHandle = await startSmtpFake({ smtpPort: 0, httpPort: 0, log: () => undefined });
  const schema = `jobs_test_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
  vi.stubEnv('SMTP_HOST', '127.0.0.1');
  vi.stubEnv('SMTP_PORT', String(fake.smtpPort));
  vi.stubEnv('SMTP_SECURE', 'false');
  vi.stubEnv('SMTP_USER', '');
  vi.stubEnv('MAIL_FROM', 'Dutywise test <desk@dutywise.test>');
  vi.stubEnv('JOBS_SCHEMA', schema);
  // Outcomes are asserted from the outbox rows; the worker's warnings would only be noise here.
  vi.stubEnv('LOG_LEVEL', 'fatal');
  // Modules read lib/env when first loaded: load them fresh, after the fake's port is known.
  vi.resetModules();
  const { db } = await import('@/db');
  const { enqueueEmail } = await import('@/lib/email/enqueue');
  const { handlers } = await import('@/lib/jobs/handlers');
  const { grantJobsSchemaSql, installQueues, MAIL_DEAD_QUEUE, MAIL_QUEUE, queues } = await import('@/lib/jobs/queues');
  // The rig's own client drives the queues one pass at a time, as the worker's pg-boss loop would.
  // The schema's owner installs the queues, as db/migrate.mts does; the app role is granted their use.
  const ownerUrl = process.env.MIGRATION_DATABASE_URL ?? process.env.DATABASE_URL;
  const owner = new PgBoss({ connectionString: ownerUrl, schema, supervise: false, schedule: false });
  owner.on('error', () => undefined);
  await owner.start();
  await installQueues(owner);
  await owner.getDb().executeSql(grantJobsSchemaSql(schema), []);
  await owner.stop({ graceful: false });
  const boss = new PgBoss({ connectionString: process.env.DATABASE_URL, schema, supervise: false, schedule: false });
  boss.on('error', () => undefined);
  await boss.start();
  const retryLimit = queues.find((q) => q.name === MAIL_QUEUE)?.options.retryLimit ?? 0;
  const domain = `${randomUUID().slice(0, 8)}.mail.test`;
  const jobTable = sql.raw(`${schema}.job`);

  async function settle(queue: string, job: PgBoss.JobWithMetadata, result: DrainResult) {
    try {
      const outcome = await handlers[queue]!(job);
      await boss.complete(queue, job.id, { outcome });
      if (outcome === 'sent') result.sent += 1;
      if (outcome === 'dead') result.dead += 1;
    } catch (error) {
      await boss.fail(queue, job.id, { message: String(error) });
      result[job.retryCount >= job.retryLimit ? 'dead' : 'retried'] += 1;
    }
  }

  return {
    fake,
    db,
    enqueueEmail,
    schema,
    /** Attempts a mail gets: the first and the queue's retries. */
    MAX_ATTEMPTS: retryLimit + 1,
    domain,
    /** A recipient address unique to this file and call. */
    address: (name = 'buyer') => `${name}-${randomUUID().slice(0, 6)}@${domain}`,
    /** One pass: up to `limit` due mail jobs, then any dead letters. */
    async drain(opts: { limit?: number } = {}): Promise<DrainResult> {
      const result: DrainResult = { claimed: 0, sent: 0, retried: 0, dead: 0 };
      const jobs = await boss.fetch<object>(MAIL_QUEUE, { batchSize: opts.limit ?? 20, includeMetadata: true });
      result.claimed = jobs.length;
      for (const job of jobs) await settle(MAIL_QUEUE, job, result);
      const dead = await boss.fetch<object>(MAIL_DEAD_QUEUE, { batchSize: 100, includeMetadata: true });
      for (const job of dead) await settle(MAIL_DEAD_QUEUE, job, result);
      return result;
    },
    /** The delivery job of an outbox row (same id). */
    job: async (outboxId: string) => {
      const job = await boss.getJobById(MAIL_QUEUE, outboxId);
      if (!job) throw new Error(`no mail job ${outboxId}`);
      return job;
    },
    /** How many jobs the mail queue holds, in any state. */
    jobCount: async () =>
      Number(
        (await db.execute<{ n: string }>(sql`select count(*) as n from ${jobTable} where name = ${MAIL_QUEUE}`)).rows[0]
          ?.n ?? 0,
      ),
    /** Time passing, without waiting for it: these mails' retries fall due now. */
    makeDue: (outboxIds: string[]) =>
      db.execute(sql`update ${jobTable} set start_after = now() - interval '1 second'
        where name = ${MAIL_QUEUE} and id in ${outboxIds}`),
    /** As if the worker holding these jobs died: their time runs out and pg-boss's maintenance fails them. */
    async expire(outboxIds: string[]) {
      await db.execute(sql`update ${jobTable} set started_on = now() - interval '1 hour'
        where name = ${MAIL_QUEUE} and id in ${outboxIds} and state = 'active'`);
      await boss.expire();
    },
    /** pg-boss's job table in this rig's schema, for tests that look at or hold a job directly. */
    jobTable,
    received: (): StoredMessage[] => fake.messages().filter((m) => m.envelope.to.some((a) => a.endsWith(`@${domain}`))),
    async close() {
      await boss.stop({ graceful: false });
      await db.execute(sql`delete from outbox where to_address like ${`%@${domain}`}`);
      const dropper = new pg.Client({ connectionString: ownerUrl });
      await dropper.connect();
      await dropper.query(`drop schema if exists ${schema} cascade`);
      await dropper.end();
      await fake.close();
      vi.unstubAllEnvs();
    },
  };
}

/** Drains until a pass claims nothing; returns how many were sent in total. */
export async function drainAll(rig: MailRig, opts: { limit?: number } = {}): Promise<number> {
  let sent = 0;
  for (let pass = 0; pass < 100; pass += 1) {
    const r = await rig.drain(opts);
    sent += r.sent;
    if (r.claimed === 0) return sent;
  }
  throw new Error('the mail queue did not empty in 100 passes');
}

export const datasheetProps = (number: string): EmailProps['datasheet-issued'] => ({
  accountName: 'Stennick Gas Storage',
  datasheetNumber: number,
  revision: 'A',
  sizingTitle: 'Regeneration gas heater',
  equipmentTag: 'H-310',
  datasheetUrl: `/datasheets/${number}`,
});

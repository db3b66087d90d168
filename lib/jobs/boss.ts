import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import PgBoss from 'pg-boss';
import type { Tx } from '@/db';
import { env } from '@/lib/env';

// One client per process and schema, kept across hot reloads (tests load modules afresh with another schema).
const globalForBoss = globalThis as unknown as { dutywiseBosses?: Map<string, PgBoss> };

/**
 * The process's pg-boss client. The app only sends (through the caller's transaction, so it never opens
 * a pool of its own); the worker starts it to fetch, retry, expire and schedule.
 */
export function getBoss(): PgBoss {
  const bosses = (globalForBoss.dutywiseBosses ??= new Map());
  let boss = bosses.get(env.JOBS_SCHEMA);
  if (!boss) {
    boss = new PgBoss({
      connectionString: env.DATABASE_URL,
      schema: env.JOBS_SCHEMA,
      application_name: 'dutywise-jobs',
    });
    bosses.set(env.JOBS_SCHEMA, boss);
  }
  return boss;
}

/** pg-boss's $1..$n statement as a Drizzle query, each value bound as one parameter (arrays included). */
function boundStatement(text: string, values: readonly unknown[] = []): SQL {
  const pieces = text.split(/\$(\d+)/);
  return sql.join(
    pieces.map((piece, i) => (i % 2 === 0 ? sql.raw(piece) : sql`${sql.param(values[Number(piece) - 1])}`)),
  );
}

/** Lets pg-boss run its statements on the caller's transaction (its documented `db` option). */
export function transactionDb(tx: Tx): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      const result = await tx.execute(boundStatement(text, values));
      return { rows: result.rows };
    },
  };
}

/**
 * Queues a job in the caller's transaction: it exists exactly when the change that causes it commits.
 * `id` makes the job findable from the row that caused it (and a second send with the same id a no-op).
 */
export async function sendJob(tx: Tx, queue: string, data: object, opts: { id?: string } = {}): Promise<void> {
  await getBoss().send(queue, data, { ...opts, db: transactionDb(tx) });
}

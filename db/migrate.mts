// Applies the committed migrations in db/migrations as the schema's owner, then installs (or upgrades) pg-boss's
// own schema and the job queues and grants the app role their use. Run by `npm run db:migrate`, the demo and the
// tests. MIGRATION_DATABASE_URL names the owner's connection; the app itself connects as a role that owns nothing
// (DATABASE_URL), so it cannot change the schema these migrations build.
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import PgBoss from 'pg-boss';
import { Pool } from 'pg';
import { DEFAULT_JOBS_SCHEMA, grantJobsSchemaSql, installQueues, MAIL_QUEUE } from '../lib/jobs/queues';

const url =
  process.env.MIGRATION_DATABASE_URL ?? process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55432/dutywise_demo';
const schema = process.env.JOBS_SCHEMA || DEFAULT_JOBS_SCHEMA;
const pool = new Pool({ connectionString: url, max: 1 });
try {
  await migrate(drizzle(pool), { migrationsFolder: new URL('./migrations', import.meta.url).pathname });
  // pg-boss versions its schema itself: start() creates it or migrates it to the installed release.
  const boss = new PgBoss({ connectionString: url, schema, max: 1, supervise: false, schedule: false });
  boss.on('error', (err: Error) => console.error(`pg-boss: ${err.message}`));
  await boss.start();
  try {
    await installQueues(boss);
    await pool.query(grantJobsSchemaSql(schema));
    // Mail queued before deliveries ran on pg-boss has no job yet; give it one (a no-op for mail that has).
    const pending = await pool.query<{ id: string }>("select id from outbox where status = 'pending'");
    for (const { id } of pending.rows) await boss.send(MAIL_QUEUE, { outboxId: id }, { id });
  } finally {
    await boss.stop({ graceful: false });
  }
  console.log(`migrations and job queues (schema ${schema}) applied to ${url.replace(/\/\/[^@]*@/, '//')}`);
} finally {
  await pool.end();
}

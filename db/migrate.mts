// Applies the committed migrations in db/migrations as the schema's owner. Run by `npm run db:migrate`, the demo
// and the tests. MIGRATION_DATABASE_URL names the owner's connection; the app itself connects as a role that owns
// nothing (DATABASE_URL), so it cannot change the schema these migrations build.
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { Pool } from 'pg';

const url =
  process.env.MIGRATION_DATABASE_URL ?? process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55432/dutywise_demo';
const pool = new Pool({ connectionString: url, max: 1 });
try {
  await migrate(drizzle(pool), { migrationsFolder: new URL('./migrations', import.meta.url).pathname });
  console.log(`migrations applied to ${url.replace(/\/\/[^@]*@/, '//')}`);
} finally {
  await pool.end();
}

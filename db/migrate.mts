// Applies the committed migrations in db/migrations. Run by `npm run db:migrate`, the demo and the tests.
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { Pool } from 'pg';

const url = process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55432/dutywise';
const pool = new Pool({ connectionString: url, max: 1 });
try {
  await migrate(drizzle(pool), { migrationsFolder: new URL('./migrations', import.meta.url).pathname });
  console.log(`migrations applied to ${url.replace(/\/\/[^@]*@/, '//')}`);
} finally {
  await pool.end();
}

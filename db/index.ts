import 'server-only';
import { drizzle } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import { env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import * as schema from './schema';

// One pool per process, reused across hot reloads in development.
const globalForDb = globalThis as unknown as { dutywisePool?: Pool };

export const pool =
  globalForDb.dutywisePool ??
  new Pool({
    connectionString: env.DATABASE_URL,
    max: env.DATABASE_POOL_MAX,
    // Fail fast when the server is down so requests answer 503 instead of hanging.
    connectionTimeoutMillis: 2_000,
    idleTimeoutMillis: 30_000,
    statement_timeout: 15_000,
  });
if (!globalForDb.dutywisePool) {
  pool.on('error', (err) => logger.warn({ err: err.message }, 'idle database client error'));
  globalForDb.dutywisePool = pool;
}

export const db = drizzle(pool, { schema, casing: 'snake_case' });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export { schema };

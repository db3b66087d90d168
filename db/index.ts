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
    // A stopped server refuses at once, so requests answer 503 without waiting for this. The limit bounds the
    // wait for a free client (under a burst, requests queue here rather than fail) and for a server that
    // never answers; 10 s stays inside a browser's or load balancer's patience.
    connectionTimeoutMillis: 10_000,
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

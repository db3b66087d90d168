import 'server-only';
import { drizzle } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import { env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import * as schema from './schema';

/** The floor of pg_trgm's `%` on every connection: words and tags at least this alike are close spellings. */
export const TRIGRAM_SIMILARITY = 0.4;
/** The floor of pg_trgm's `<%`: a customer name holding a word at least this alike is a close spelling. */
export const TRIGRAM_WORD_SIMILARITY = 0.6;

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
    // Session settings of every connection, sent when it opens so no query pays a round trip for them: no JIT
    // (compiling costs the app's short queries more than it saves), and the trigram similarity floors of the
    // support look-up's close-spelling operators (`%` for words and tags, `<%` for customer names).
    options: `-c jit=off -c pg_trgm.similarity_threshold=${TRIGRAM_SIMILARITY} -c pg_trgm.word_similarity_threshold=${TRIGRAM_WORD_SIMILARITY}`,
  });
if (!globalForDb.dutywisePool) {
  pool.on('error', (err) => logger.warn({ err: err.message }, 'idle database client error'));
  globalForDb.dutywisePool = pool;
}

export const db = drizzle(pool, { schema, casing: 'snake_case' });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
/** Either the pool or a transaction, for reads that need no transaction of their own. */
export type Queryable = Pick<Db, 'execute'>;
export { schema };

import 'server-only';
import { RateLimiterPostgres } from 'rate-limiter-flexible';
import { db, pool } from '@/db';
import { rateLimitCounters } from '@/db/schema';
import { getTableName, lt } from 'drizzle-orm';

// rate-limiter-flexible's PostgreSQL store over the app's pool. Counters live in one table (created by a
// migration, so the app's role needs no DDL), shared by every instance. A key over its limit is also refused in
// memory until its window ends, so a flood costs no database writes. One limiter sweeps rows that expired more
// than an hour ago every five minutes, which keeps the table to the keys seen lately.
const TABLE = getTableName(rateLimitCounters);
const cache = new Map<string, RateLimiterPostgres>();
let sweeperChosen = false;

/** The shared limiter for one prefix, points and window (created once per process). */
export function limiterFor(prefix: string, points: number, durationS: number): RateLimiterPostgres {
  const id = `${prefix}|${points}|${durationS}`;
  let limiter = cache.get(id);
  if (!limiter) {
    limiter = new RateLimiterPostgres({
      storeClient: pool,
      storeType: 'pool',
      tableName: TABLE,
      tableCreated: true,
      keyPrefix: prefix,
      points,
      duration: durationS,
      inMemoryBlockOnConsumed: points + 1,
      clearExpiredByTimeout: !sweeperChosen,
    });
    sweeperChosen = true;
    cache.set(id, limiter);
  }
  return limiter;
}

/** Deletes counters whose window ended before `beforeMs` (epoch ms); the worker's housekeeping runs it too. */
export async function purgeExpiredCounters(beforeMs = Date.now() - 3_600_000): Promise<number> {
  const gone = await db
    .delete(rateLimitCounters)
    .where(lt(rateLimitCounters.expire, beforeMs))
    .returning({ key: rateLimitCounters.key });
  return gone.length;
}

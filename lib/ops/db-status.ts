import { Pool } from 'pg';
import { env } from '@/lib/env';

// A cheap answer to "is the database up?" for middleware: one tiny pool, one ping at most every
// CHECK_MS, the last answer reused in between. Pages then answer 503 at once instead of hanging.
const CHECK_MS = 2_000;
let pool: Pool | null = null;
let last = { up: true, at: 0 };
let pending: Promise<boolean> | null = null;

function ping(): Promise<boolean> {
  if (!pool) {
    pool = new Pool({
      connectionString: env.DATABASE_URL,
      max: 1,
      connectionTimeoutMillis: 1_500,
      idleTimeoutMillis: 10_000,
    });
    // An idle connection dropped by a stopped server must not crash the process; the next ping reports it.
    pool.on('error', () => undefined);
  }
  return pool
    .query('select 1')
    .then(() => true)
    .catch(() => false);
}

/** Whether the database answered its latest ping (refreshed in the background at most every 2 s). */
export async function databaseUp(): Promise<boolean> {
  const now = Date.now();
  if (now - last.at < CHECK_MS) return last.up;
  pending ??= ping().then((up) => {
    last = { up, at: Date.now() };
    pending = null;
    return up;
  });
  // When it was down, wait for the fresh answer so recovery is seen at once; when up, do not slow the request.
  return last.up ? last.up : pending;
}

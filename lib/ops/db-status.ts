import { Pool } from 'pg';
import { env } from '@/lib/env';

// "Is the database up?" for middleware, asked on every page and API request so that the very first request
// after PostgreSQL stops gets the 503 page (a cached "up" let one request through to fail as a bare 500).
// One tiny pool of its own, so a busy main pool cannot make the database look down; concurrent requests
// share one ping in flight, so a burst costs one round trip (well under a millisecond on a local network).
let pool: Pool | null = null;
let pending: Promise<boolean> | null = null;

function pingPool(): Pool {
  if (!pool) {
    pool = new Pool({
      connectionString: env.DATABASE_URL,
      max: 1,
      connectionTimeoutMillis: 1_500,
      // A connection that vanished without a word (a dropped network) must not hold the request up.
      query_timeout: 1_500,
      idleTimeoutMillis: 30_000,
    });
    // An idle connection dropped by a stopped server must not crash the process; the next ping reports it.
    pool.on('error', () => undefined);
  }
  return pool;
}

async function ping(): Promise<boolean> {
  // A second try on a fresh connection, so one connection killed by a restart does not read as an outage.
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      await pingPool().query('select 1');
      return true;
    } catch {
      // try again once
    }
  }
  return false;
}

/** Whether the database answers now; concurrent callers share one ping. */
export function databaseUp(): Promise<boolean> {
  pending ??= ping().finally(() => {
    pending = null;
  });
  return pending;
}

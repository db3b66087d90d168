import 'server-only';
import { sql } from 'drizzle-orm';
import { db } from '@/db';

export type RateDecision = { allowed: boolean; remaining: number; retryAfterS: number };

/**
 * Fixed-window counter held in PostgreSQL, so every app instance shares it. One upsert a call:
 * a new window starts when the stored one is older than `windowS`.
 */
export async function consumeRate(key: string, limit: number, windowS: number): Promise<RateDecision> {
  const res = await db.execute<{ count: number; age_s: number }>(sql`
    insert into rate_limits as r (key, window_start, count) values (${key}, now(), 1)
    on conflict (key) do update set
      count = case when r.window_start <= now() - make_interval(secs => ${windowS}) then 1 else r.count + 1 end,
      window_start = case when r.window_start <= now() - make_interval(secs => ${windowS}) then now() else r.window_start end
    returning count, extract(epoch from now() - window_start)::float8 as age_s`);
  const row = res.rows[0] ?? { count: 1, age_s: 0 };
  const allowed = row.count <= limit;
  return {
    allowed,
    remaining: Math.max(0, limit - row.count),
    retryAfterS: allowed ? 0 : Math.max(1, Math.ceil(windowS - row.age_s)),
  };
}

/** The client address as the nearest trusted proxy reports it; loopback when there is none. */
export function clientKey(headers: Headers): string {
  const forwarded = headers.get('x-forwarded-for')?.split(',')[0]?.trim();
  return (forwarded || headers.get('x-real-ip') || '127.0.0.1').slice(0, 64);
}

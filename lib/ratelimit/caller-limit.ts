import 'server-only';
import { getTableName } from 'drizzle-orm';
import { pool } from '@/db';
import { rateLimitCounters } from '@/db/schema';
import { logger } from '@/lib/log/logger';
import { groupedSpender } from './grouped-spend';

// One budget per caller of the calculate API: a signed-in person, an API key, or (anonymous) a client address.
// The counters are shared by every instance (lib/ratelimit/grouped-spend.ts), spent in grouped round trips:
// this is the busiest limit in the app, and one statement per calculation cost more than the calculation.

export type LimitScope = 'user' | 'api-key' | 'address';
export type CallerBudget = { scope: LimitScope; id: string; perMinute: number };
export type LimitOutcome = CallerBudget & { allowed: boolean; remaining: number; resetS: number; retryAfterS: number };

const WINDOW_S = 60;
const scopeWords: Record<LimitScope, string> = {
  user: 'per signed-in user',
  'api-key': 'per API key',
  address: 'per client address',
};

const spend = groupedSpender(pool, getTableName(rateLimitCounters));

// A caller over its limit is refused in memory until its window ends, so a flood costs no database writes.
const MAX_BLOCKED = 10_000;
const blocked = new Map<string, { until: number; perMinute: number }>();

function refusedInMemory(key: string, perMinute: number, now: number): number | null {
  const b = blocked.get(key);
  if (!b) return null;
  if (b.until <= now || b.perMinute !== perMinute) {
    blocked.delete(key);
    return null;
  }
  return b.until;
}

function remember(key: string, until: number, perMinute: number): void {
  if (blocked.size >= MAX_BLOCKED) {
    const now = Date.now();
    for (const [k, b] of blocked) if (b.until <= now) blocked.delete(k);
    if (blocked.size >= MAX_BLOCKED) blocked.clear();
  }
  blocked.set(key, { until, perMinute });
}

/**
 * Spends one request of the caller's budget. When the shared counter cannot be reached (database down) the
 * request is let through: refusing every calculation because the limiter is unavailable would turn a database
 * fault into an outage of the desk.
 */
export async function spendCallerBudget(budget: CallerBudget): Promise<LimitOutcome> {
  // The key as rate-limiter-flexible writes it (prefix:key), so both kinds of counter read alike in the table.
  const key = `calculate.${budget.scope}:${budget.id.slice(0, 200)}`;
  const decision = (consumed: number, expire: number): LimitOutcome => {
    const resetS = Math.max(1, Math.ceil((expire - Date.now()) / 1000));
    const allowed = consumed <= budget.perMinute;
    return { ...budget, allowed, remaining: budget.perMinute - consumed, resetS, retryAfterS: allowed ? 0 : resetS };
  };
  const until = refusedInMemory(key, budget.perMinute, Date.now());
  if (until !== null) return decision(budget.perMinute + 1, until);
  try {
    const spent = await spend(key, 1, WINDOW_S * 1000);
    if (spent.consumed > budget.perMinute) remember(key, spent.expire, budget.perMinute);
    return decision(spent.consumed, spent.expire);
  } catch (err) {
    logger.warn({ err: (err as Error).message, scope: budget.scope }, 'rate limiter unavailable; request allowed');
    return { ...budget, allowed: true, remaining: budget.perMinute, resetS: WINDOW_S, retryAfterS: 0 };
  }
}

/** The limit that applied, in the RateLimit header fields of the IETF httpapi draft (limit, remaining, reset). */
export function rateLimitHeaders(o: LimitOutcome): Record<string, string> {
  return {
    'RateLimit-Limit': String(o.perMinute),
    'RateLimit-Remaining': String(Math.max(0, o.remaining)),
    'RateLimit-Reset': String(o.resetS),
    'RateLimit-Policy': `${o.perMinute};w=${WINDOW_S};comment="${scopeWords[o.scope]}"`,
  };
}

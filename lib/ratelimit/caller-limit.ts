import 'server-only';
import { logger } from '@/lib/log/logger';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { limiterFor } from './store';

// One budget per caller of the calculate API: a signed-in person, an API key, or (anonymous) a client address.
// The small interface the route uses; the counter underneath is rate-limiter-flexible's PostgreSQL store.

export type LimitScope = 'user' | 'api-key' | 'address';
export type CallerBudget = { scope: LimitScope; id: string; perMinute: number };
export type LimitOutcome = CallerBudget & { allowed: boolean; remaining: number; resetS: number; retryAfterS: number };

const WINDOW_S = 60;
const scopeWords: Record<LimitScope, string> = {
  user: 'per signed-in user',
  'api-key': 'per API key',
  address: 'per client address',
};

/**
 * Spends one request of the caller's budget. When the shared counter cannot be reached (database down) the
 * request is let through: refusing every calculation because the limiter is unavailable would turn a database
 * fault into an outage of the desk.
 */
export async function spendCallerBudget(budget: CallerBudget): Promise<LimitOutcome> {
  const limiter = limiterFor(`calculate.${budget.scope}`, budget.perMinute, WINDOW_S);
  const decision = (res: RateLimiterRes, allowed: boolean): LimitOutcome => {
    const resetS = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
    return { ...budget, allowed, remaining: res.remainingPoints, resetS, retryAfterS: allowed ? 0 : resetS };
  };
  try {
    return decision(await limiter.consume(budget.id.slice(0, 200)), true);
  } catch (err) {
    if (err instanceof RateLimiterRes) return decision(err, false);
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

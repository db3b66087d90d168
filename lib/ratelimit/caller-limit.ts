import 'server-only';
import { logger } from '@/lib/log/logger';
import { consumeShared } from './shared-counter';

// One budget per caller of the calculate API: a signed-in person, an API key, or (anonymous) a client address.
// The small interface the route uses; the counter underneath is the shared PostgreSQL one.

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
  try {
    const d = await consumeShared(`calculate:${budget.scope}:${budget.id}`, budget.perMinute, WINDOW_S);
    return { ...budget, ...d };
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

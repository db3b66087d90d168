import 'server-only';
import { createHash } from 'node:crypto';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { AppError } from '@/lib/errors';
import { logger } from '@/lib/log/logger';
import { policies, type PolicyName } from './policies';
import { limiterFor } from './store';

export type RateDecision = { allowed: boolean; retryAfterS: number };

/** A refusal: actions return it as a 429 form error, route handlers as a 429 with Retry-After. */
export class RateLimitedError extends AppError {
  constructor(retryAfterS: number, what: string) {
    super('rate_limited', `Too many ${what}; try again in ${retryAfterS} s.`, [], { retryAfterS });
    this.name = 'RateLimitedError';
  }
}

/** Keys that may hold personal data (e-mail addresses) are stored as a digest. */
export function digestKey(value: string): string {
  return createHash('sha256').update(value.trim().toLowerCase()).digest('hex').slice(0, 40);
}

/** Spends `points` of `key`'s budget under the named policy. */
export async function consume(name: PolicyName, key: string, points = 1): Promise<RateDecision> {
  const policy = policies[name];
  try {
    await limiterFor(name, policy.points, policy.durationS).consume(key.slice(0, 200), points);
    return { allowed: true, retryAfterS: 0 };
  } catch (err) {
    if (err instanceof RateLimiterRes)
      return { allowed: false, retryAfterS: Math.max(1, Math.ceil(err.msBeforeNext / 1000)) };
    if ('failOpen' in policy && policy.failOpen) {
      logger.warn({ err: (err as Error).message, name }, 'rate limiter unavailable; request allowed');
      return { allowed: true, retryAfterS: 0 };
    }
    throw err;
  }
}

/** Spends from every budget named (all of them, so each counts the attempt); throws RateLimitedError if any is spent. */
export async function enforce(what: string, ...budgets: [PolicyName, string][]): Promise<void> {
  let worst = 0;
  for (const [name, key] of budgets) {
    const d = await consume(name, key);
    if (!d.allowed) worst = Math.max(worst, d.retryAfterS);
  }
  if (worst) throw new RateLimitedError(worst, what);
}

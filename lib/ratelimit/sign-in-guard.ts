import 'server-only';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { env } from '@/lib/env';
import { digestKey, RateLimitedError } from './limit';
import { limiterFor } from './store';

// Failed sign-ins are counted per account (the e-mail address typed, known or not, so the answer never tells
// which addresses exist), whatever address they come from. After RATE_LIMIT_SIGN_IN_FAILURES failures in a row
// each further failure locks the account's sign-in for a doubling interval: 15 s, 30 s, 1 min... capped at
// 15 min, so a guesser gets a handful of tries an hour while the owner is kept out for minutes at worst.
// A successful sign-in clears the count. The lock is checked before any password is hashed.
const FIRST_LOCK_S = 15;
const MAX_LOCK_S = 15 * 60;
const COUNT_WINDOW_S = 24 * 3600;

const failures = () => limiterFor('sign-in-failures', 1_000_000, COUNT_WINDOW_S);
const lock = () => limiterFor('sign-in-lock', 1, MAX_LOCK_S);

/** The lock after `failed` failures in a row, in seconds (0 below the threshold). */
export function lockSecondsAfter(failed: number, threshold = env.RATE_LIMIT_SIGN_IN_FAILURES): number {
  if (failed < threshold) return 0;
  return Math.min(MAX_LOCK_S, FIRST_LOCK_S * 2 ** (failed - threshold));
}

/** Throws RateLimitedError while the account's sign-in is locked. */
export async function assertSignInOpen(email: string): Promise<void> {
  const res = await lock().get(digestKey(email));
  if (res && res.consumedPoints > 1 && res.msBeforeNext > 0)
    throw new RateLimitedError(Math.ceil(res.msBeforeNext / 1000), 'failed sign-ins for this account');
}

/** Counts a failure and locks the account when the count calls for it; returns the lock in seconds (0 for none). */
export async function recordSignInFailure(email: string): Promise<number> {
  const key = digestKey(email);
  let failed: number;
  try {
    failed = (await failures().penalty(key, 1)).consumedPoints;
  } catch (err) {
    if (!(err instanceof RateLimiterRes)) throw err;
    failed = err.consumedPoints;
  }
  const seconds = lockSecondsAfter(failed);
  if (seconds) await lock().block(key, seconds);
  return seconds;
}

/** A successful sign-in clears the account's failure count. */
export async function clearSignInFailures(email: string): Promise<void> {
  await failures().delete(digestKey(email));
}

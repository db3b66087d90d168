import 'server-only';
import { headers } from 'next/headers';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { clientKey, consumeRate } from './consume';

/** For public server actions (sign-up, invitation): returns when allowed, throws a 429 AppError when not. */
export async function limitPublicAction(name: string): Promise<void> {
  const rate = await consumeRate(`${name}:${clientKey(await headers())}`, env.RATE_LIMIT_SIGN_IN_PER_MIN, 60);
  if (!rate.allowed)
    throw new AppError('rate_limited', `Too many attempts; try again in ${rate.retryAfterS} s.`, [], {
      retryAfterS: rate.retryAfterS,
    });
}

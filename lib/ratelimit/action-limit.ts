import 'server-only';
import { headers } from 'next/headers';
import { env } from '@/lib/env';
import { clientKey, consumeRate } from './consume';

/** For public server actions (sign-up, invitation): null when allowed, else a 429 result to return. */
export async function limitPublicAction(name: string) {
  const rate = await consumeRate(`${name}:${clientKey(await headers())}`, env.RATE_LIMIT_SIGN_IN_PER_MIN, 60);
  if (rate.allowed) return null;
  return {
    ok: false as const,
    fieldErrors: {},
    formError: `Too many attempts; try again in ${rate.retryAfterS} s.`,
    status: 429,
  };
}

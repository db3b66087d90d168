import { checkLocalCredentials, startLocalSession } from '@/lib/auth/local/session';
import { signInSchema } from '@/lib/auth/schema';
import { clerkEnabled, env } from '@/lib/env';
import { AppError, parseOrThrow } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { readJsonBody } from '@/lib/http/json';
import { tooManyRequests } from '@/lib/http/respond';
import { clientKey, consumeRate } from '@/lib/ratelimit/consume';

export const runtime = 'nodejs';

/** Local identity sign-in: sets the session cookie. Rate limited per client address. */
export const POST = defineHandler(
  async (req) => {
    if (clerkEnabled) throw new AppError('not_found', 'Sign in through the hosted sign-in form.');
    const rate = await consumeRate(`sign-in:${clientKey(req.headers)}`, env.RATE_LIMIT_SIGN_IN_PER_MIN, 60);
    if (!rate.allowed) return tooManyRequests(rate.retryAfterS, 'sign-in attempts');
    const { email, password } = parseOrThrow(signInSchema, await readJsonBody(req, 4 * 1024));
    const user = await checkLocalCredentials(email, password);
    if (!user) throw new AppError('unauthenticated', 'That e-mail and password do not match a Dutywise user.');
    await startLocalSession(user.id, user.role);
    return Response.json({ signedIn: true });
  },
  { name: 'auth.sign_in' },
);

import { checkLocalCredentials, startLocalSession } from '@/lib/auth/local/session';
import { resendVerification } from '@/lib/auth/local/verification';
import { HOME_PATH } from '@/lib/auth/home';
import { signInSchema } from '@/lib/auth/schema';
import { appOrigin, clerkEnabled, env } from '@/lib/env';
import { AppError, parseOrThrow } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { readJsonBody } from '@/lib/http/json';
import { limitRequest } from '@/lib/ratelimit/guard-request';
import { assertSignInOpen, clearSignInFailures, recordSignInFailure } from '@/lib/ratelimit/sign-in-guard';
import { safeNextPath } from '@/lib/security/safe-redirect';

export const runtime = 'nodejs';

/** A browser posting from another site (login CSRF): its Origin, or Sec-Fetch-Site, names a different site. */
function crossSite(req: Request): boolean {
  const origin = req.headers.get('origin');
  if (origin && origin !== appOrigin) return true;
  return req.headers.get('sec-fetch-site') === 'cross-site';
}

/**
 * Local identity sign-in: sets the session cookie and answers where to go next (always a path on this site).
 * Refused from another site's page; limited per client address and, for failures, per account with a back-off.
 */
export const POST = defineHandler(
  async (req) => {
    if (clerkEnabled) throw new AppError('not_found', 'Sign in through the hosted sign-in form.');
    if (crossSite(req)) throw new AppError('forbidden', 'Sign in from the Dutywise sign-in page.');
    const limited = await limitRequest(req, 'sign-in', 'sign-in attempts');
    if (limited) return limited;
    const body = await readJsonBody(req, 4 * 1024);
    const { email, password } = parseOrThrow(signInSchema, body);
    // Past the account's failure budget: a 429 naming the wait (lib/ratelimit/sign-in-guard.ts).
    await assertSignInOpen(email);
    const outcome = await checkLocalCredentials(email, password);
    if (outcome.status === 'mismatch') {
      await recordSignInFailure(email);
      throw new AppError('unauthenticated', 'That e-mail and password do not match a Dutywise user.');
    }
    await clearSignInFailures(email);
    if (outcome.status === 'unverified') {
      await resendVerification(outcome.user.id);
      throw new AppError(
        'forbidden',
        'Confirm your e-mail address first: follow the link we sent when you signed up. We have sent a new one.',
      );
    }
    await startLocalSession(outcome.user.id);
    const next = (body as { next?: unknown }).next;
    return Response.json({ signedIn: true, redirectTo: safeNextPath(next, env.APP_URL, HOME_PATH) });
  },
  { name: 'auth.sign_in' },
);

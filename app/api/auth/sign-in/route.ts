import { checkLocalCredentials, startLocalSession } from '@/lib/auth/local/session';
import { resendVerification } from '@/lib/auth/local/verification';
import { signInSchema } from '@/lib/auth/schema';
import { appOrigin, clerkEnabled, env } from '@/lib/env';
import { readJsonBody, tooManyRequests, zodErrors } from '@/lib/http/json';
import { limitRequest } from '@/lib/ratelimit/guard-request';
import { RateLimitedError } from '@/lib/ratelimit/limit';
import { assertSignInOpen, clearSignInFailures, recordSignInFailure } from '@/lib/ratelimit/sign-in-guard';
import { safeNextPath } from '@/lib/security/safe-redirect';

export const runtime = 'nodejs';

const refuse = (status: number, message: string) => Response.json({ errors: [{ path: '', message }] }, { status });

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
export async function POST(req: Request) {
  if (clerkEnabled) return refuse(404, 'Sign in through the hosted sign-in form.');
  if (crossSite(req)) return refuse(403, 'Sign in from the Dutywise sign-in page.');
  const limited = await limitRequest(req, 'sign-in', 'sign-in attempts');
  if (limited) return limited;
  const body = await readJsonBody(req, 4 * 1024);
  if (!body.ok) return body.response;
  const parsed = signInSchema.safeParse(body.value);
  if (!parsed.success) return Response.json({ errors: zodErrors(parsed.error) }, { status: 400 });
  const { email, password } = parsed.data;
  try {
    await assertSignInOpen(email);
  } catch (err) {
    if (err instanceof RateLimitedError) return tooManyRequests(err.retryAfterS, 'failed sign-ins for this account');
    throw err;
  }
  const outcome = await checkLocalCredentials(email, password);
  if (outcome.status === 'mismatch') {
    await recordSignInFailure(email);
    return refuse(401, 'That e-mail and password do not match a Dutywise user.');
  }
  await clearSignInFailures(email);
  if (outcome.status === 'unverified') {
    await resendVerification(outcome.user.id);
    return refuse(
      403,
      'Confirm your e-mail address first: follow the link we sent when you signed up. We have sent a new one.',
    );
  }
  await startLocalSession(outcome.user.id);
  const next = (body.value as { next?: unknown }).next;
  return Response.json({ signedIn: true, redirectTo: safeNextPath(next, env.APP_URL) });
}

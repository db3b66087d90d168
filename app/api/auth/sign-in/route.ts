import { checkLocalCredentials, startLocalSession } from '@/lib/auth/local/session';
import { signInSchema } from '@/lib/auth/schema';
import { clerkEnabled, env } from '@/lib/env';
import { readJsonBody, tooManyRequests, zodErrors } from '@/lib/http/json';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { unavailableJson } from '@/lib/ops/unavailable';
import { clientKey, consumeRate } from '@/lib/ratelimit/consume';

export const runtime = 'nodejs';

/** Local identity sign-in: sets the session cookie. Rate limited per client address; 503 while the database is down. */
export async function POST(req: Request) {
  try {
    return await signIn(req);
  } catch (err) {
    if (isDatabaseDown(err)) return unavailableJson();
    throw err;
  }
}

async function signIn(req: Request): Promise<Response> {
  if (clerkEnabled)
    return Response.json(
      { errors: [{ path: '', message: 'Sign in through the hosted sign-in form.' }] },
      { status: 404 },
    );
  const rate = await consumeRate(`sign-in:${clientKey(req.headers)}`, env.RATE_LIMIT_SIGN_IN_PER_MIN, 60);
  if (!rate.allowed) return tooManyRequests(rate.retryAfterS, 'sign-in attempts');
  const body = await readJsonBody(req, 4 * 1024);
  if (!body.ok) return body.response;
  const parsed = signInSchema.safeParse(body.value);
  if (!parsed.success) return Response.json({ errors: zodErrors(parsed.error) }, { status: 400 });
  const user = await checkLocalCredentials(parsed.data.email, parsed.data.password);
  if (!user)
    return Response.json(
      { errors: [{ path: '', message: 'That e-mail and password do not match a Dutywise user.' }] },
      { status: 401 },
    );
  await startLocalSession(user.id, user.role);
  return Response.json({ signedIn: true });
}

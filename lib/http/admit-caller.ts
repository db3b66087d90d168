import 'server-only';
import { identifyApiCaller, type ApiCaller } from '@/lib/auth/request-caller';
import { env } from '@/lib/env';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { unavailableJson } from '@/lib/ops/unavailable';
import { rateLimitHeaders, spendCallerBudget, type CallerBudget } from '@/lib/ratelimit/caller-limit';
import { tooManyRequests } from './respond';

export type Admitted = {
  ok: true;
  caller: ApiCaller & { kind: 'api-key' | 'user' | 'anonymous' };
  headers: Record<string, string>;
};

function budgetOf(caller: Admitted['caller']): CallerBudget {
  if (caller.kind === 'api-key') return { scope: 'api-key', id: caller.key.keyId, perMinute: caller.key.perMinute };
  if (caller.kind === 'user')
    return { scope: 'user', id: caller.userId, perMinute: env.RATE_LIMIT_CALCULATE_PER_USER_PER_MIN };
  return { scope: 'address', id: caller.address, perMinute: env.RATE_LIMIT_CALCULATE_PER_MIN };
}

const badKey = () =>
  Response.json(
    {
      errors: [
        {
          path: 'authorization',
          message:
            'The API key is not valid: it was revoked, its owner was disabled, or it never existed. Send "Authorization: Bearer <key>" with an active key, or no Authorization header to call anonymously.',
        },
      ],
    },
    { status: 401, headers: { 'WWW-Authenticate': 'Bearer realm="dutywise"' } },
  );

/**
 * Who may call, under which budget: 401 for a key that is not (or no longer) valid, 503 when a key cannot be
 * checked because the database is down, 429 past the caller's own limit; otherwise the rate-limit headers to send.
 */
export async function admitCaller(req: Request): Promise<Admitted | { ok: false; response: Response }> {
  let caller: ApiCaller;
  try {
    caller = await identifyApiCaller(req);
  } catch (err) {
    if (isDatabaseDown(err)) return { ok: false, response: unavailableJson() };
    throw err;
  }
  if (caller.kind === 'bad-key') return { ok: false, response: badKey() };
  const outcome = await spendCallerBudget(budgetOf(caller));
  const headers = rateLimitHeaders(outcome);
  if (!outcome.allowed) return { ok: false, response: tooManyRequests(outcome.retryAfterS, 'requests', headers) };
  return { ok: true, caller, headers };
}

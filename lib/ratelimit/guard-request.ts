import 'server-only';
import { tooManyRequests } from '@/lib/http/respond';
import { clientKey } from './client';
import { consume } from './limit';
import type { PolicyName } from './policies';

/** Applies a per-client-address limit to a route handler: a 429 Response when over, null otherwise. */
export async function limitRequest(req: Request, name: PolicyName, what = 'requests'): Promise<Response | null> {
  const rate = await consume(name, clientKey(req.headers));
  return rate.allowed ? null : tooManyRequests(rate.retryAfterS, what);
}

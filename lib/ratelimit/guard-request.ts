import 'server-only';
import { logger } from '@/lib/log/logger';
import { tooManyRequests } from '@/lib/http/respond';
import { clientKey } from './consume';
import { consumeShared } from './shared-counter';

/**
 * Applies a per-address limit to a public endpoint: a 429 Response when over, null otherwise.
 * If the shared counter cannot be reached (database down) the request is let through: refusing
 * every calculation because the limiter is unavailable would turn a database fault into an outage.
 */
export async function limitRequest(req: Request, name: string, perMinute: number): Promise<Response | null> {
  try {
    const rate = await consumeShared(`${name}:${clientKey(req.headers)}`, perMinute, 60);
    return rate.allowed ? null : tooManyRequests(rate.retryAfterS, 'requests');
  } catch (err) {
    logger.warn({ err: (err as Error).message, name }, 'rate limiter unavailable; request allowed');
    return null;
  }
}

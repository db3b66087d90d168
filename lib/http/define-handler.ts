import 'server-only';
import { AppError } from '@/lib/errors';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { describeDbError } from '@/lib/ops/health';
import { UNAVAILABLE_MESSAGE, UNAVAILABLE_RETRY_AFTER_S } from '@/lib/ops/unavailable';
import { errorResponse, expectedError } from './respond';

export type HandlerContext = { params: Promise<Record<string, string>> };

/**
 * A wrapped handler. Next reads the last signature when it checks a route's exports (the context must not be
 * optional there); tests call it with the request alone through the first.
 */
export type RouteHandler = {
  (req: Request): Promise<Response>;
  (req: Request, ctx: HandlerContext): Promise<Response>;
};

/**
 * The one wrapper for route handlers: an AppError (or the engine's refusal) becomes its status and the
 * shared error body, a dead database 503, anything else is logged and answered 500 with `failure`.
 */
export function defineHandler(
  handler: (req: Request, ctx: HandlerContext) => Promise<Response>,
  opts: { name: string; failure?: string },
) {
  const wrapped = async (req: Request, ctx: HandlerContext = { params: Promise.resolve({}) }): Promise<Response> => {
    try {
      return await handler(req, ctx);
    } catch (err) {
      const known = expectedError(err);
      if (known) return errorResponse(known);
      if (isDatabaseDown(err)) {
        logger.warn({ handler: opts.name, reason: describeDbError(err) }, 'database unreachable; answered 503');
        return errorResponse(
          new AppError('unavailable', UNAVAILABLE_MESSAGE, [], { retryAfterS: UNAVAILABLE_RETRY_AFTER_S }),
        );
      }
      logger.error({ err, handler: opts.name, url: req.url }, 'route handler failed');
      return errorResponse(new AppError('internal', opts.failure ?? 'Something went wrong on our side.'));
    }
  };
  return wrapped as RouteHandler;
}

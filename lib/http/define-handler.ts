import 'server-only';
import { AppError } from '@/lib/errors';
import { logger } from '@/lib/log/logger';
import { describeDbError } from '@/lib/ops/health';
import { errorResponse, expectedError } from './respond';

export type HandlerContext = { params: Promise<Record<string, string>> };

function isDbDown(err: unknown): boolean {
  const code =
    (err as { code?: string; cause?: { code?: string } })?.code ?? (err as { cause?: { code?: string } })?.cause?.code;
  return (
    code === 'ECONNREFUSED' ||
    code === '57P01' ||
    code === '57P03' ||
    /timeout exceeded when trying to connect|Connection terminated/i.test(String((err as Error)?.message))
  );
}

/**
 * The one wrapper for route handlers: an AppError (or the engine's refusal) becomes its status and the
 * shared error body, a dead database 503, anything else is logged and answered 500 with `failure`.
 */
export function defineHandler(
  handler: (req: Request, ctx: HandlerContext) => Promise<Response>,
  opts: { name: string; failure?: string },
) {
  return async (req: Request, ctx: HandlerContext = { params: Promise.resolve({}) }): Promise<Response> => {
    try {
      return await handler(req, ctx);
    } catch (err) {
      const known = expectedError(err);
      if (known) return errorResponse(known);
      if (isDbDown(err))
        return errorResponse(
          new AppError('unavailable', `Service temporarily unavailable: ${describeDbError(err)}`, [], {
            retryAfterS: 5,
          }),
        );
      logger.error({ err, handler: opts.name, url: req.url }, 'route handler failed');
      return errorResponse(new AppError('internal', opts.failure ?? 'Something went wrong on our side.'));
    }
  };
}

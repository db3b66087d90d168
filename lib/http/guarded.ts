import 'server-only';
import { AuthError, NotFoundError } from '@/lib/auth/guards';
import { ActionError } from '@/lib/actions/define-action';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { describeDbError } from '@/lib/ops/health';
import { unavailableJson } from '@/lib/ops/unavailable';

type RouteContext = { params: Promise<Record<string, string>> };

/** Wraps a route handler: identity and expected errors become honest status codes, a dead database 503. */
export function guarded(handler: (req: Request, ctx: RouteContext) => Promise<Response>) {
  return async (req: Request, ctx: RouteContext): Promise<Response> => {
    try {
      return await handler(req, ctx);
    } catch (err) {
      if (err instanceof AuthError || err instanceof NotFoundError)
        return Response.json({ errors: [{ path: '', message: err.message }] }, { status: err.status });
      if (err instanceof ActionError)
        return Response.json(
          { errors: [{ path: '', message: err.message }], fieldErrors: err.fieldErrors },
          { status: err.status },
        );
      if (isDatabaseDown(err)) {
        logger.warn({ url: req.url, reason: describeDbError(err) }, 'database unreachable; answered 503');
        return unavailableJson();
      }
      logger.error({ err, url: req.url }, 'route handler failed');
      return Response.json({ errors: [{ path: '', message: 'Something went wrong on our side.' }] }, { status: 500 });
    }
  };
}

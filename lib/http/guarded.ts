import 'server-only';
import { AuthError, NotFoundError } from '@/lib/auth/guards';
import { ActionError } from '@/lib/actions/define-action';
import { logger } from '@/lib/log/logger';
import { describeDbError } from '@/lib/ops/health';

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

/** Wraps a route handler: identity and expected errors become honest status codes, a dead database 503. */
export function guarded(
  handler: (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>,
) {
  return async (req: Request, ctx: { params: Promise<Record<string, string>> }): Promise<Response> => {
    try {
      return await handler(req, ctx);
    } catch (err) {
      if (err instanceof AuthError || err instanceof NotFoundError)
        return Response.json({ errors: [{ path: '', message: err.message }] }, { status: err.status });
      if (err instanceof ActionError) {
        // A rate-limit refusal says when to come back.
        const retry = (err as { retryAfterS?: number }).retryAfterS;
        return Response.json(
          { errors: [{ path: '', message: err.message }], fieldErrors: err.fieldErrors },
          { status: err.status, headers: retry ? { 'Retry-After': String(retry) } : undefined },
        );
      }
      if (isDbDown(err))
        return Response.json(
          { errors: [{ path: '', message: `Service temporarily unavailable: ${describeDbError(err)}` }] },
          { status: 503, headers: { 'Retry-After': '5' } },
        );
      logger.error({ err, url: req.url }, 'route handler failed');
      return Response.json({ errors: [{ path: '', message: 'Something went wrong on our side.' }] }, { status: 500 });
    }
  };
}

import 'server-only';
import { AppError, errorBody, invalidInput } from '@/lib/errors';
import { SizingInputError } from '@/lib/engine';

/** The one responder: an AppError as its status and `{ errors: [{ path, message }] }`, with Retry-After when it has one. */
export function errorResponse(
  err: AppError,
  extra: Record<string, unknown> = {},
  more: Record<string, string> = {},
): Response {
  const headers = new Headers({ ...more, 'Cache-Control': 'no-store' });
  if (err.retryAfterS !== undefined) headers.set('Retry-After', String(err.retryAfterS));
  return Response.json({ ...errorBody(err), ...extra }, { status: err.status, headers });
}

/** A 429 for a public endpoint: what was limited and when to try again. */
export function tooManyRequests(retryAfterS: number, what: string, headers: Record<string, string> = {}): Response {
  return errorResponse(
    new AppError('rate_limited', `Too many ${what}; try again in ${retryAfterS} s.`, [], { retryAfterS }),
    {},
    headers,
  );
}

/**
 * The failures a caller should hear about, as AppError; null for anything else (a bug, logged and answered
 * generically). The sizing engine is framework-free and throws its own error: it is converted here.
 */
export function expectedError(err: unknown): AppError | null {
  if (err instanceof AppError) return err;
  if (err instanceof SizingInputError) return invalidInput(err.issues);
  return null;
}

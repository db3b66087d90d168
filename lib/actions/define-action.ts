import 'server-only';
import type { z } from 'zod';
import { AuthError, NotFoundError, requireUser } from '@/lib/auth/guards';
import type { CurrentUser } from '@/lib/auth/current-user';
import type { Permission } from '@/lib/auth/roles';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { UNAVAILABLE_MESSAGE } from '@/lib/ops/unavailable';

export type FieldErrors = Record<string, string[]>;
export type ActionResult<T> =
  { ok: true; data: T } | { ok: false; fieldErrors: FieldErrors; formError: string | null; status: number };

/** An expected failure inside a handler (conflict, payment needed...): returned, not thrown. */
export class ActionError extends Error {
  constructor(
    message: string,
    readonly status = 409,
    readonly fieldErrors: FieldErrors = {},
  ) {
    super(message);
  }
}

/** What an action answers while the database cannot be reached: nothing was saved, nothing is lost. */
export const unavailableResult = {
  ok: false,
  fieldErrors: {},
  formError: UNAVAILABLE_MESSAGE,
  status: 503,
} as const satisfies ActionResult<never>;

export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_form';
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/**
 * The one wrapper for server actions: authenticate, authorise, parse with the shared zod schema,
 * call the domain code. Expected failures come back as values; anything else is logged and reported generically.
 */
export function defineAction<S extends z.ZodType, T>(
  opts: { permission: Permission; schema: S; name: string },
  handler: (input: z.output<S>, user: CurrentUser) => Promise<T>,
) {
  return async (raw: unknown): Promise<ActionResult<T>> => {
    try {
      const user = await requireUser(opts.permission);
      const parsed = opts.schema.safeParse(raw);
      if (!parsed.success) {
        return {
          ok: false,
          fieldErrors: fieldErrorsOf(parsed.error),
          formError: 'Some fields need attention.',
          status: 400,
        };
      }
      return { ok: true, data: await handler(parsed.data, user) };
    } catch (err) {
      if (err instanceof AuthError || err instanceof NotFoundError) {
        return { ok: false, fieldErrors: {}, formError: err.message, status: err.status };
      }
      if (err instanceof ActionError)
        return { ok: false, fieldErrors: err.fieldErrors, formError: err.message, status: err.status };
      if (isDatabaseDown(err)) {
        logger.warn({ action: opts.name }, 'database unreachable; action answered 503');
        return unavailableResult;
      }
      logger.error({ err, action: opts.name }, 'server action failed');
      return {
        ok: false,
        fieldErrors: {},
        formError: 'Something went wrong on our side; nothing was saved. Try again.',
        status: 500,
      };
    }
  };
}

import 'server-only';
import type { z } from 'zod';
import { clerkEnabled } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { limitPublicAction } from '@/lib/ratelimit/action-limit';
import type { PolicyName } from '@/lib/ratelimit/policies';
import { ActionError, fieldErrorsOf, type ActionResult } from './define-action';

/**
 * The wrapper for actions people call before they are signed in (sign-up, invitations, password reset, e-mail
 * confirmation): local identity only, parse with the shared schema, spend the client address's budget for this
 * form, call the domain code. Expected failures come back as values, like defineAction's.
 */
export function definePublicAction<S extends z.ZodType, T>(
  opts: { schema: S; name: string; limit: PolicyName; clerkMessage: string },
  handler: (input: z.output<S>) => Promise<T>,
) {
  return async (raw: unknown): Promise<ActionResult<T>> => {
    if (clerkEnabled) return { ok: false, fieldErrors: {}, formError: opts.clerkMessage, status: 400 };
    const parsed = opts.schema.safeParse(raw);
    if (!parsed.success)
      return {
        ok: false,
        fieldErrors: fieldErrorsOf(parsed.error),
        formError: 'Some fields need attention.',
        status: 400,
      };
    try {
      await limitPublicAction(opts.limit);
      return { ok: true, data: await handler(parsed.data) };
    } catch (err) {
      if (err instanceof ActionError)
        return { ok: false, fieldErrors: err.fieldErrors, formError: err.message, status: err.status };
      logger.error({ err, action: opts.name }, 'public action failed');
      return {
        ok: false,
        fieldErrors: {},
        formError: 'Something went wrong on our side; nothing was changed. Try again.',
        status: 500,
      };
    }
  };
}

import 'server-only';
import type * as zc from 'zod/v4/core';
import { requireUser } from '@/lib/auth/guards';
import type { CurrentUser } from '@/lib/auth/current-user';
import type { Permission } from '@/lib/auth/roles';
import { AppError, errorBody, parseOrThrow, type ErrorBody } from '@/lib/errors';
import { expectedError } from '@/lib/http/respond';
import { clerkEnabled } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { limitPublicAction } from '@/lib/ratelimit/action-limit';
import type { PolicyName } from '@/lib/ratelimit/policies';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { UNAVAILABLE_MESSAGE, UNAVAILABLE_RETRY_AFTER_S } from '@/lib/ops/unavailable';

/** A failed action: its status and the same `errors` list a route handler answers with. */
export type ActionFailure = { ok: false; status: number } & ErrorBody;
export type ActionResult<T> = { ok: true; data: T } | ActionFailure;

type ActionOptions<S extends zc.$ZodType> = {
  schema: S;
  /** `<concern>.<verb>_<object>` in snake case, as it appears in logs. */
  name: string;
  /** What the caller reads when something unexpected fails. */
  failure?: string;
};

function failureOf(err: AppError): ActionFailure {
  return { ok: false, status: err.status, ...errorBody(err) };
}

async function run<S extends zc.$ZodType, T>(
  opts: ActionOptions<S>,
  work: (raw: unknown) => Promise<T>,
  raw: unknown,
): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await work(raw) };
  } catch (err) {
    const known = expectedError(err);
    if (known) return failureOf(known);
    if (isDatabaseDown(err)) {
      // Nothing was saved, nothing is lost: the caller is told so and when to try again.
      logger.warn({ action: opts.name }, 'database unreachable; action answered 503');
      return failureOf(
        new AppError('unavailable', UNAVAILABLE_MESSAGE, [], { retryAfterS: UNAVAILABLE_RETRY_AFTER_S }),
      );
    }
    logger.error({ err, action: opts.name }, 'server action failed');
    return failureOf(
      new AppError('internal', opts.failure ?? 'Something went wrong on our side; nothing was saved. Try again.'),
    );
  }
}

/**
 * The one wrapper for server actions: authenticate, authorise, parse with the shared zod schema, call the
 * domain code. Expected failures (AppError) come back as values; anything else is logged and reported generically.
 */
export function defineAction<S extends zc.$ZodType, T>(
  opts: ActionOptions<S> & { permission: Permission },
  handler: (input: zc.output<S>, user: CurrentUser) => Promise<T>,
) {
  return (raw: unknown): Promise<ActionResult<T>> =>
    run(
      opts,
      async (input) => {
        const user = await requireUser(opts.permission);
        return handler(parseOrThrow(opts.schema, input), user);
      },
      raw,
    );
}

/**
 * The wrapper for actions people call before they are signed in (sign-up, invitations, password reset, e-mail
 * confirmation): local identity only, parse with the shared schema, spend the client address's budget for this
 * form, call the domain code. Expected failures come back as values, like defineAction's.
 */
export function definePublicAction<S extends zc.$ZodType, T>(
  opts: ActionOptions<S> & { limit: PolicyName; clerkMessage: string },
  handler: (input: zc.output<S>) => Promise<T>,
) {
  return (raw: unknown): Promise<ActionResult<T>> =>
    run(
      opts,
      async (input) => {
        if (clerkEnabled) throw new AppError('invalid_input', opts.clerkMessage);
        const parsed = parseOrThrow(opts.schema, input);
        await limitPublicAction(opts.limit);
        return handler(parsed);
      },
      raw,
    );
}

'use server';

import { signUpCustomer } from '@/lib/accounts/mutations';
import { ActionError, fieldErrorsOf, unavailableResult, type ActionResult } from '@/lib/actions/define-action';
import { startLocalSession } from '@/lib/auth/local/session';
import { signUpSchema } from '@/lib/auth/schema';
import { clerkEnabled } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { limitPublicAction } from '@/lib/ratelimit/action-limit';

/**
 * Self-serve sign-up on the local identity: a customer user and their own customer account, then a session.
 * Not wrapped in defineAction: it is called by someone who is not signed in yet.
 */
export async function signUpAction(raw: unknown): Promise<ActionResult<{ accountId: string }>> {
  if (clerkEnabled)
    return { ok: false, fieldErrors: {}, formError: 'Create your account with the hosted form.', status: 400 };
  const parsed = signUpSchema.safeParse(raw);
  if (!parsed.success)
    return {
      ok: false,
      fieldErrors: fieldErrorsOf(parsed.error),
      formError: 'Some fields need attention.',
      status: 400,
    };
  try {
    const limited = await limitPublicAction('sign-up');
    if (limited) return limited;
    const { site, ...rest } = parsed.data;
    const created = await signUpCustomer({ ...rest, site: site || undefined });
    await startLocalSession(created.userId, created.role);
    return { ok: true, data: { accountId: created.accountId } };
  } catch (err) {
    if (err instanceof ActionError)
      return { ok: false, fieldErrors: err.fieldErrors, formError: err.message, status: err.status };
    if (isDatabaseDown(err)) return unavailableResult;
    logger.error({ err, action: 'auth.sign_up' }, 'sign-up failed');
    return {
      ok: false,
      fieldErrors: {},
      formError: 'Something went wrong on our side; no account was created. Try again.',
      status: 500,
    };
  }
}

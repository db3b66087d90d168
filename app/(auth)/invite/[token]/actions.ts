'use server';

import { acceptInvitation } from '@/lib/accounts/mutations';
import { acceptInviteSchema } from '@/lib/accounts/schema';
import { ActionError, fieldErrorsOf, unavailableResult, type ActionResult } from '@/lib/actions/define-action';
import { startLocalSession } from '@/lib/auth/local/session';
import { clerkEnabled } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { limitPublicAction } from '@/lib/ratelimit/action-limit';

/** Turns an invitation into a customer sign-in of that account, then signs the new user in. The token is the authority. */
export async function acceptInviteAction(raw: unknown): Promise<ActionResult<{ joined: true }>> {
  if (clerkEnabled)
    return {
      ok: false,
      fieldErrors: {},
      formError: 'Invitations are accepted through the hosted sign-up.',
      status: 400,
    };
  const parsed = acceptInviteSchema.safeParse(raw);
  if (!parsed.success)
    return {
      ok: false,
      fieldErrors: fieldErrorsOf(parsed.error),
      formError: 'Some fields need attention.',
      status: 400,
    };
  try {
    const limited = await limitPublicAction('invite');
    if (limited) return limited;
    const { userId, role } = await acceptInvitation(parsed.data.token, parsed.data.name, parsed.data.password);
    await startLocalSession(userId, role);
    return { ok: true, data: { joined: true } };
  } catch (err) {
    if (err instanceof ActionError)
      return { ok: false, fieldErrors: err.fieldErrors, formError: err.message, status: err.status };
    if (isDatabaseDown(err)) return unavailableResult;
    logger.error({ err, action: 'auth.accept_invite' }, 'accepting an invitation failed');
    return {
      ok: false,
      fieldErrors: {},
      formError: 'Something went wrong on our side; nothing was created. Try again.',
      status: 500,
    };
  }
}

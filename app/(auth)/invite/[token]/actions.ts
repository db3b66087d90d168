'use server';

import { acceptInvitation } from '@/lib/accounts/mutations';
import { acceptInviteSchema } from '@/lib/accounts/schema';
import { definePublicAction } from '@/lib/actions/define-action';
import { startLocalSession } from '@/lib/auth/local/session';
import { clerkEnabled } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { limitPublicAction } from '@/lib/ratelimit/action-limit';

/** Turns an invitation into a customer sign-in of that account, then signs the new user in. The token is the authority. */
export const acceptInviteAction = definePublicAction(
  {
    schema: acceptInviteSchema,
    name: 'auth.accept_invitation',
    failure: 'Something went wrong on our side; nothing was created. Try again.',
  },
  async (input) => {
    if (clerkEnabled) throw new AppError('invalid_input', 'Invitations are accepted through the hosted sign-up.');
    await limitPublicAction('invite');
    const { userId, role } = await acceptInvitation(input.token, input.name, input.password);
    await startLocalSession(userId, role);
    return { joined: true as const };
  },
);

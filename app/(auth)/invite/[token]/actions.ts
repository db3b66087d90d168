'use server';

import { acceptInvitation } from '@/lib/accounts/mutations';
import { acceptInviteSchema } from '@/lib/accounts/schema';
import { definePublicAction } from '@/lib/actions/define-action';
import { startLocalSession } from '@/lib/auth/local/session';

/** Turns an invitation into a customer sign-in of that account, then signs the new user in. The token is the authority. */
export const acceptInviteAction = definePublicAction(
  {
    schema: acceptInviteSchema,
    name: 'auth.accept_invite',
    limit: 'invite-accept',
    clerkMessage: 'Invitations are accepted through the hosted sign-up.',
    failure: 'Something went wrong on our side; nothing was created. Try again.',
  },
  async ({ token, name, password }) => {
    const { userId } = await acceptInvitation(token, name, password);
    await startLocalSession(userId);
    return { joined: true as const };
  },
);

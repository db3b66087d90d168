'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { inviteMember, updateAccount } from '@/lib/accounts/mutations';
import { accountUpdateSchema, inviteSchema } from '@/lib/accounts/schema';
import { demoMode } from '@/lib/env';

export const updateAccountAction = defineAction(
  { permission: 'account:manage', schema: accountUpdateSchema, name: 'account.update' },
  async (input, user) => {
    const { accountId, ...fields } = input;
    await updateAccount(user, accountId, fields);
    revalidatePath('/accounts');
    revalidatePath(`/accounts/${accountId}`);
    return { accountId };
  },
);

/** The invite link goes only to the invitee's inbox; in demo mode (local mail fake) it also comes back to show. */
export const inviteMemberAction = defineAction(
  { permission: 'member:invite', schema: inviteSchema, name: 'account.invite_member' },
  async (input, user) => {
    const { inviteUrl } = await inviteMember(user, input);
    revalidatePath(`/accounts/${input.accountId}`);
    return { email: input.email, inviteUrl: demoMode ? inviteUrl : null };
  },
);

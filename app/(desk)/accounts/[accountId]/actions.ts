'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { inviteMember, updateAccount } from '@/lib/accounts/mutations';
import { accountUpdateSchema, inviteSchema } from '@/lib/accounts/schema';

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

/** The invite link comes back so the demo (local mail fake) can show it beside "sent to". */
export const inviteMemberAction = defineAction(
  { permission: 'member:invite', schema: inviteSchema, name: 'account.invite_member' },
  async (input, user) => {
    const { inviteUrl } = await inviteMember(user, input);
    revalidatePath(`/accounts/${input.accountId}`);
    return { email: input.email, inviteUrl };
  },
);

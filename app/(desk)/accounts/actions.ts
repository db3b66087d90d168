'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { createAccount } from '@/lib/accounts/mutations';
import { accountCreateSchema } from '@/lib/accounts/schema';

/** Staff create a customer account for a prospect. */
export const createAccountAction = defineAction(
  { permission: 'account:manage', schema: accountCreateSchema, name: 'account.create' },
  async (input, user) => {
    const row = await createAccount(user, input);
    revalidatePath('/accounts');
    return row;
  },
);

'use server';

import { signUpCustomer } from '@/lib/accounts/mutations';
import { definePublicAction } from '@/lib/actions/define-action';
import { startLocalSession } from '@/lib/auth/local/session';
import { signUpSchema } from '@/lib/auth/schema';
import { clerkEnabled } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { limitPublicAction } from '@/lib/ratelimit/action-limit';

/** Self-serve sign-up on the local identity: a customer user and their own customer account, then a session. */
export const signUpAction = definePublicAction(
  {
    schema: signUpSchema,
    name: 'auth.sign_up',
    failure: 'Something went wrong on our side; no account was created. Try again.',
  },
  async (input) => {
    if (clerkEnabled) throw new AppError('invalid_input', 'Create your account with the hosted form.');
    await limitPublicAction('sign-up');
    const { site, ...rest } = input;
    const created = await signUpCustomer({ ...rest, site: site || undefined });
    await startLocalSession(created.userId, created.role);
    return { accountId: created.accountId };
  },
);

'use server';

import { signUpCustomer } from '@/lib/accounts/sign-up';
import { definePublicAction } from '@/lib/actions/define-action';
import { signUpSchema } from '@/lib/auth/schema';

/**
 * Self-serve sign-up on the local identity: a customer user and their own customer account, active once the
 * address is confirmed through the mailed link. The answer is the same whether or not the address had a sign-in.
 */
export const signUpAction = definePublicAction(
  {
    schema: signUpSchema,
    name: 'auth.sign_up',
    limit: 'sign-up',
    clerkMessage: 'Create your account with the hosted form.',
    failure: 'Something went wrong on our side; no account was created. Try again.',
  },
  async ({ site, ...rest }) => {
    await signUpCustomer({ ...rest, site: site || undefined });
    return { email: rest.email };
  },
);

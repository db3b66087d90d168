'use server';

import { definePublicAction } from '@/lib/actions/define-action';
import { forgotPasswordSchema } from '@/lib/auth/schema';
import { requestPasswordReset } from '@/lib/auth/local/password-reset';

/** Mails a reset link when the address has a sign-in; answers the same whether or not it does. */
export const requestPasswordResetAction = definePublicAction(
  {
    schema: forgotPasswordSchema,
    name: 'auth.request_reset',
    limit: 'password-reset',
    clerkMessage: 'Reset your password from the hosted sign-in form.',
  },
  async ({ email }) => {
    await requestPasswordReset(email);
    return { email };
  },
);

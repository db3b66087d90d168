'use server';

import { definePublicAction } from '@/lib/actions/define-action';
import { AppError } from '@/lib/errors';
import { resetPasswordSchema } from '@/lib/auth/schema';
import { resetPassword } from '@/lib/auth/local/password-reset';

/** Sets a new password from a mailed link; every session of the user ends. */
export const resetPasswordAction = definePublicAction(
  {
    schema: resetPasswordSchema,
    name: 'auth.reset_password',
    limit: 'password-reset',
    clerkMessage: 'Reset your password from the hosted sign-in form.',
  },
  async ({ token, password }) => {
    if (!(await resetPassword(token, password)))
      throw new AppError('gone', 'This link is not valid any more: it was used already or has expired.');
    return { reset: true as const };
  },
);

'use server';

import { z } from 'zod';
import { definePublicAction } from '@/lib/actions/define-action';
import { AppError } from '@/lib/errors';
import { mailedTokenSchema } from '@/lib/auth/schema';
import { verifyEmailToken } from '@/lib/auth/local/verification';

/**
 * Confirms an address from its mailed link. It does not sign anyone in: the person signs in with their password
 * next, so a link opened by someone else cannot hand them a session on an account they did not set up.
 */
export const verifyEmailAction = definePublicAction(
  {
    schema: z.object({ token: mailedTokenSchema }),
    name: 'auth.verify_email',
    limit: 'verify-resend',
    clerkMessage: 'Addresses are confirmed by the hosted sign-up.',
  },
  async ({ token }) => {
    const done = await verifyEmailToken(token);
    if (!done) throw new AppError('gone', 'This link is not valid any more: it was used already or has expired.');
    return { verified: true as const };
  },
);

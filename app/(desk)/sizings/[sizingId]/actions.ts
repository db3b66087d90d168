'use server';

import { z } from 'zod';
import { defineAction } from '@/lib/actions/define-action';
import { resendDatasheetEmail } from '@/lib/support/resend';

export const resendDatasheetEmailAction = defineAction(
  {
    permission: 'support:search',
    schema: z.object({ sizingId: z.uuid({ message: 'Unknown sizing.' }) }),
    name: 'support.resend_datasheet',
  },
  async (input, user) => resendDatasheetEmail(user, input.sizingId),
);

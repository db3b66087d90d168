'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { resendDatasheetEmail } from '@/lib/support/resend';
import { resendSchema } from '@/lib/support/schema';

/** Support: send a copy of a chosen datasheet revision's notice to a chosen recipient. */
export const resendDatasheetEmailAction = defineAction(
  { permission: 'support:search', schema: resendSchema, name: 'support.resend_datasheet' },
  async (input, user) => {
    const out = await resendDatasheetEmail(user, input);
    revalidatePath(`/sizings/${input.sizingId}`);
    return out;
  },
);

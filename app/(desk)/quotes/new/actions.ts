'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { createQuote } from '@/lib/quotes/mutations';
import { quoteCreateSchema } from '@/lib/quotes/schema';

/** Creates a draft quote with the picked sizings of one customer account as its lines. */
export const createQuoteAction = defineAction(
  { permission: 'quote:manage', schema: quoteCreateSchema, name: 'quote.create' },
  async (input, user) => {
    const quote = await createQuote(user, input);
    revalidatePath('/quotes');
    revalidatePath(`/accounts/${input.accountId}`);
    return quote;
  },
);

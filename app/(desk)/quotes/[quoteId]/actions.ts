'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { bindQuoteDocument } from '@/lib/quotes/document/bind';
import { addQuoteItem, removeQuoteItem, sendQuote, setQuoteLinePrice, setQuoteStatus } from '@/lib/quotes/mutations';
import {
  quoteIdSchema,
  quoteItemRemoveSchema,
  quoteItemSchema,
  quoteLinePriceSchema,
  quoteStatusSchema,
} from '@/lib/quotes/schema';

function refresh(quoteId: string) {
  revalidatePath('/quotes');
  revalidatePath(`/quotes/${quoteId}`);
}

export const addQuoteLineAction = defineAction(
  { permission: 'quote:manage', schema: quoteItemSchema, name: 'quote.add_line' },
  async (input, user) => {
    await addQuoteItem(user, input.quoteId, input.sizingId, input.quantity);
    refresh(input.quoteId);
    return { quoteId: input.quoteId };
  },
);

export const removeQuoteLineAction = defineAction(
  { permission: 'quote:manage', schema: quoteItemRemoveSchema, name: 'quote.remove_line' },
  async (input, user) => {
    await removeQuoteItem(user, input.quoteId, input.itemId);
    refresh(input.quoteId);
    return { quoteId: input.quoteId };
  },
);

/** Sets or clears a draft line's unit price (in the account's currency). */
export const setQuoteLinePriceAction = defineAction(
  { permission: 'quote:manage', schema: quoteLinePriceSchema, name: 'quote.line_price' },
  async (input, user) => {
    await setQuoteLinePrice(user, input);
    refresh(input.quoteId);
    return { unitPrice: input.unitPrice };
  },
);

export const setQuoteStatusAction = defineAction(
  { permission: 'quote:manage', schema: quoteStatusSchema, name: 'quote.set_status' },
  async (input, user) => {
    await setQuoteStatus(user, input.quoteId, input.status);
    refresh(input.quoteId);
    return { status: input.status };
  },
);

/**
 * Marks the quote sent and queues the e-mail to the account's billing contact; answers with the address and whether
 * the e-mail also invited the contact to join the account.
 */
export const sendQuoteAction = defineAction(
  { permission: 'quote:manage', schema: quoteIdSchema, name: 'quote.send' },
  async (input, user) => {
    const { to, invited } = await sendQuote(user, input.quoteId);
    refresh(input.quoteId);
    return { to, invited };
  },
);

/** Binds the sent quote and its current datasheets into one stored PDF, or answers the unchanged latest edition. */
export const bindQuotePdfAction = defineAction(
  { permission: 'quote:manage', schema: quoteIdSchema, name: 'quote.bind_pdf' },
  async (input, user) => {
    const { edition, created } = await bindQuoteDocument(user, input.quoteId);
    refresh(input.quoteId);
    return { edition: edition.edition, pageCount: edition.pageCount, created };
  },
);

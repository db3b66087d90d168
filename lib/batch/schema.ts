import { z } from 'zod';

// Client-safe: the batch desk builds this object and the commit handler parses it.

/** Where a checked sheet's rows are saved: a customer account, and optionally an existing or a new draft quote. */
export const batchTargetSchema = z.object({
  accountId: z.uuid({ message: 'Choose the customer account.' }),
  quoteId: z.uuid().optional(),
  newQuoteTitle: z.string().trim().min(3).max(160).optional(),
});
export type BatchTarget = z.output<typeof batchTargetSchema>;

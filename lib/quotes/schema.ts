import * as z from 'zod/mini';
import '@/lib/validation/english-messages';

export const quoteStatuses = ['draft', 'sent', 'won', 'lost'] as const;

export const quoteCreateSchema = z.object({
  accountId: z.uuid({ message: 'Choose the customer account.' }),
  title: z
    .string()
    .check(
      z.trim(),
      z.minLength(3, { message: 'Title needs 3 to 160 characters.' }),
      z.maxLength(160, { message: 'Title needs 3 to 160 characters.' }),
    ),
  notes: z.optional(
    z.string().check(z.trim(), z.maxLength(4000, { message: 'Notes are limited to 4000 characters.' })),
  ),
  sizingIds: z._default(z.array(z.uuid()).check(z.maxLength(200)), []),
});
export type QuoteCreateInput = z.output<typeof quoteCreateSchema>;

export const quoteItemSchema = z.object({
  quoteId: z.uuid(),
  sizingId: z.uuid({ message: 'Choose a saved sizing.' }),
  quantity: z._default(
    z.coerce
      .number()
      .check(
        z.refine(Number.isInteger, { message: 'Quantity is a whole number.' }),
        z.gte(1, { message: 'Quantity must be 1 to 1000.' }),
        z.lte(1000, { message: 'Quantity must be 1 to 1000.' }),
      ),
    1,
  ),
});

/** A line's unit price in the account's currency; empty clears it. */
export const quoteLinePriceSchema = z.object({
  quoteId: z.uuid(),
  itemId: z.uuid(),
  unitPrice: z.pipe(
    z.pipe(
      z.string().check(z.trim()),
      z.transform((v) => v.replace(/,/g, '')),
    ),
    z.pipe(
      z.union([
        z.literal(''),
        z.string().check(
          z.regex(/^\d{1,12}(\.\d{1,2})?$/, {
            message: 'Enter the unit price as a number with up to 2 decimals, e.g. 12500 or 12500.50.',
          }),
        ),
      ]),
      z.transform((v) => (v === '' ? null : v)),
    ),
  ),
});

export const quoteStatusSchema = z.object({ quoteId: z.uuid(), status: z.enum(quoteStatuses) });
export const quoteIdSchema = z.object({ quoteId: z.uuid() });
export const quoteItemRemoveSchema = z.object({ quoteId: z.uuid(), itemId: z.uuid() });

export const quoteFilterSchema = z.object({
  status: z.catch(z.optional(z.enum(quoteStatuses)), undefined),
  accountId: z.catch(z.optional(z.uuid()), undefined),
  q: z.catch(z.optional(z.string().check(z.trim(), z.maxLength(100))), undefined),
});
export type QuoteFilter = z.output<typeof quoteFilterSchema>;

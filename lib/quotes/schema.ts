import { z } from 'zod';

export const quoteStatuses = ['draft', 'sent', 'won', 'lost'] as const;

export const quoteCreateSchema = z.object({
  accountId: z.uuid({ message: 'Choose the customer account.' }),
  title: z
    .string()
    .trim()
    .min(3, { message: 'Title needs 3 to 160 characters.' })
    .max(160, { message: 'Title needs 3 to 160 characters.' }),
  notes: z.string().trim().max(4000, { message: 'Notes are limited to 4000 characters.' }).optional(),
  sizingIds: z.array(z.uuid()).max(200).default([]),
});
export type QuoteCreateInput = z.output<typeof quoteCreateSchema>;

export const quoteItemSchema = z.object({
  quoteId: z.uuid(),
  sizingId: z.uuid({ message: 'Choose a saved sizing.' }),
  quantity: z.coerce
    .number()
    .int({ message: 'Quantity is a whole number.' })
    .min(1, { message: 'Quantity must be 1 to 1000.' })
    .max(1000, { message: 'Quantity must be 1 to 1000.' })
    .default(1),
});

/** A line's unit price in the account's currency; empty clears it. */
export const quoteLinePriceSchema = z.object({
  quoteId: z.uuid(),
  itemId: z.uuid(),
  unitPrice: z
    .string()
    .trim()
    .transform((v) => v.replace(/,/g, ''))
    .pipe(
      z.union([
        z.literal(''),
        z.string().regex(/^\d{1,12}(\.\d{1,2})?$/, {
          message: 'Enter the unit price as a number with up to 2 decimals, e.g. 12500 or 12500.50.',
        }),
      ]),
    )
    .transform((v) => (v === '' ? null : v)),
});

export const quoteStatusSchema = z.object({ quoteId: z.uuid(), status: z.enum(quoteStatuses) });
export const quoteIdSchema = z.object({ quoteId: z.uuid() });
export const quoteItemRemoveSchema = z.object({ quoteId: z.uuid(), itemId: z.uuid() });

export const quoteFilterSchema = z.object({
  status: z.enum(quoteStatuses).optional().catch(undefined),
  accountId: z.uuid().optional().catch(undefined),
  q: z.string().trim().max(100).optional().catch(undefined),
});
export type QuoteFilter = z.output<typeof quoteFilterSchema>;

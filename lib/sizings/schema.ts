import { z } from 'zod';

/** Metadata saved with a sizing; the engineering input itself is validated by the engine's schema. */
export const sizingMetaSchema = z.object({
  accountId: z.uuid({ message: 'Choose the customer account to save to.' }),
  quoteId: z
    .union([z.literal(''), z.uuid()])
    .optional()
    .transform((v) => (v ? v : undefined)),
  title: z
    .string()
    .trim()
    .min(3, { message: 'Title needs 3 to 160 characters.' })
    .max(160, { message: 'Title needs 3 to 160 characters.' }),
  equipmentTag: z
    .string()
    .trim()
    .max(60, { message: 'Equipment tag is limited to 60 characters.' })
    .regex(/^[\p{L}\p{N} ._\-/#()]*$/u, { message: 'Equipment tag may use letters, digits, spaces and . _ - / # ( ).' })
    .optional()
    .transform((v) => (v ? v : undefined)),
  notes: z
    .string()
    .trim()
    .max(4000, { message: 'Notes are limited to 4000 characters.' })
    .optional()
    .transform((v) => (v ? v : undefined)),
  revisedFromId: z.uuid().optional(),
});
export type SizingMeta = z.output<typeof sizingMetaSchema>;

export const saveSizingSchema = sizingMetaSchema.extend({ input: z.unknown() });
export type SaveSizingInput = z.output<typeof saveSizingSchema>;

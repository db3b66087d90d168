import * as z from 'zod/mini';
import '@/lib/validation/english-messages';

/** Empty text (a form's untouched field) reads as absent. */
const blankToUndefined = <T>(v: T | '' | undefined) => (v ? v : undefined);

/** Metadata saved with a sizing; the engineering input itself is validated by the engine's schema. */
export const sizingMetaSchema = z.object({
  accountId: z.uuid({ message: 'Choose the customer account to save to.' }),
  quoteId: z.pipe(z.optional(z.union([z.literal(''), z.uuid()])), z.transform(blankToUndefined)),
  title: z
    .string()
    .check(
      z.trim(),
      z.minLength(3, { message: 'Title needs 3 to 160 characters.' }),
      z.maxLength(160, { message: 'Title needs 3 to 160 characters.' }),
    ),
  equipmentTag: z.pipe(
    z.optional(
      z.string().check(
        z.trim(),
        z.maxLength(60, { message: 'Equipment tag is limited to 60 characters.' }),
        z.regex(/^[\p{L}\p{N} ._\-/#()]*$/u, {
          message: 'Equipment tag may use letters, digits, spaces and . _ - / # ( ).',
        }),
      ),
    ),
    z.transform(blankToUndefined),
  ),
  notes: z.pipe(
    z.optional(z.string().check(z.trim(), z.maxLength(4000, { message: 'Notes are limited to 4000 characters.' }))),
    z.transform(blankToUndefined),
  ),
  revisedFromId: z.optional(z.uuid()),
});
export type SizingMeta = z.output<typeof sizingMetaSchema>;

export const saveSizingSchema = z.extend(sizingMetaSchema, { input: z.unknown() });
export type SaveSizingInput = z.output<typeof saveSizingSchema>;

import { z } from 'zod';

const num = (what: string) =>
  z.preprocess(
    (v) => (v === '' || v == null ? undefined : Number(v)),
    z
      .number({ message: `${what} must be a number.` })
      .finite()
      .min(0, { message: `${what} cannot be negative.` })
      .max(1e7)
      .optional(),
  );
const day = (what: string) =>
  z.preprocess(
    (v) => (v === '' || v == null ? undefined : v),
    z
      .string()
      .regex(/^\d{4}-\d{2}-\d{2}$/, { message: `${what} must be a date (YYYY-MM-DD).` })
      .optional(),
  );

export const searchSorts = ['newest', 'oldest', 'largest', 'smallest', 'relevance'] as const;

/** The support look-up's query, as held in the URL so a search can be shared. */
export const supportSearchSchema = z.object({
  q: z
    .string()
    .trim()
    .max(100, { message: 'Search text is limited to 100 characters.' })
    .optional()
    .transform((v) => (v ? v : undefined)),
  service: z.enum(['heater', 'compressor']).optional().catch(undefined),
  gas: z
    .string()
    .trim()
    .max(40)
    .regex(/^[a-z0-9-]*$/)
    .optional()
    .catch(undefined)
    .transform((v) => (v ? v : undefined)),
  minKw: num('Minimum kW'),
  maxKw: num('Maximum kW'),
  from: day('From date'),
  to: day('To date'),
  creator: z.uuid().optional().catch(undefined),
  quoteStatus: z.enum(['draft', 'sent', 'won', 'lost']).optional().catch(undefined),
  accountId: z.uuid().optional().catch(undefined),
  // No sort chosen: best match while text is typed, newest otherwise (lib/support/numbers.ts effectiveSort).
  sort: z.enum(searchSorts).optional().catch(undefined),
  // Where the page starts: an opaque token from the previous page's `nextCursor` (keyset paging).
  cursor: z
    .string()
    .max(400)
    .regex(/^[A-Za-z0-9_-]+$/)
    .optional()
    .catch(undefined),
  // The page's number, for display only: the cursor says where it starts.
  page: z.coerce.number().int().min(1).max(100_000).default(1).catch(1),
  pageSize: z.coerce
    .number()
    .int()
    .refine((n) => [25, 50, 100].includes(n))
    .default(25)
    .catch(25),
});
export type SupportSearch = z.output<typeof supportSearchSchema>;

/** Support's resend of a datasheet notice: which revision (the latest when left out) and to whom (the billing contact). */
export const resendSchema = z.object({
  sizingId: z.uuid({ message: 'Unknown sizing.' }),
  revisionId: z
    .union([z.literal(''), z.uuid({ message: 'Choose a revision of this datasheet.' })])
    .optional()
    .transform((v) => v || undefined),
  to: z
    .union([
      z.literal(''),
      z.email({ message: 'Enter one e-mail address, such as name@example.com.' }).max(320, {
        message: 'The address is limited to 320 characters.',
      }),
    ])
    .optional()
    .transform((v) => v?.trim() || undefined),
});
export type ResendInput = z.output<typeof resendSchema>;

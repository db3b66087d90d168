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
  page: z.coerce.number().int().min(1).max(10_000).default(1).catch(1),
  pageSize: z.coerce
    .number()
    .int()
    .refine((n) => [25, 50, 100].includes(n))
    .default(25)
    .catch(25),
});
export type SupportSearch = z.output<typeof supportSearchSchema>;

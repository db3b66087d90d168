import { z } from 'zod';

/** What the issue form and action send; shared by both. */
export const issueDatasheetSchema = z.object({
  sizingId: z.uuid({ message: 'Choose a saved sizing to issue.' }),
  note: z
    .string({ message: 'The revision note must be text.' })
    .trim()
    .max(500, { message: 'The revision note is limited to 500 characters.' })
    .optional()
    .transform((v) => (v ? v : undefined)),
});

export type IssueDatasheetInput = z.output<typeof issueDatasheetSchema>;

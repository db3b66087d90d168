import { z } from 'zod';

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, { message: `At most ${max} characters.` })
    .optional()
    .transform((v) => (v ? v : undefined));

const optionalNumber = (min: number, max: number, what: string) =>
  z.preprocess(
    (v) => (v === '' || v === null || v === undefined ? undefined : typeof v === 'string' ? Number(v) : v),
    z
      .number({ message: `${what} must be a number.` })
      .finite({ message: `${what} must be a finite number.` })
      .min(min, { message: `${what} must be between ${min} and ${max}.` })
      .max(max, { message: `${what} must be between ${min} and ${max}.` })
      .optional(),
  );

/** A customer account as sales engineers create it for a prospect. */
export const accountInputSchema = z.object({
  name: z
    .string()
    .trim()
    .min(2, { message: 'Company name needs 2 to 120 characters.' })
    .max(120, { message: 'Company name needs 2 to 120 characters.' }),
  site: optionalText(160),
  billingContactName: optionalText(120),
  billingContactEmail: z
    .union([z.literal(''), z.email({ message: 'Billing contact e-mail is not a valid address.' }).max(254)])
    .optional()
    .transform((v) => (v ? v : undefined)),
  barometricPressureKpa: optionalNumber(50, 110, 'Site barometric pressure (kPa)'),
  siteAltitudeM: optionalNumber(-500, 6000, 'Site altitude (m)'),
  unitSystem: z.enum(['si', 'us'], { message: 'Choose SI or US customary units.' }).default('si'),
});
export type AccountInput = z.output<typeof accountInputSchema>;

export const accountUpdateSchema = accountInputSchema.extend({ accountId: z.uuid() });

export const inviteSchema = z.object({
  accountId: z.uuid({ message: 'Choose an account.' }),
  email: z.email({ message: 'Enter a valid e-mail address.' }).max(254),
});
export type InviteInput = z.output<typeof inviteSchema>;

export const acceptInviteSchema = z.object({
  token: z.string().min(20).max(200),
  name: z.string().trim().min(2, { message: 'Enter your name (2 to 100 characters).' }).max(100),
  password: z.string().min(10, { message: 'Use at least 10 characters.' }).max(200),
});

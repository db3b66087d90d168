import { z } from 'zod';
import { mailedTokenSchema, nameText, newPasswordSchema } from '@/lib/auth/schema';

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
  name: nameText('the company name', 2, 120),
  site: optionalText(160),
  billingContactName: optionalText(120),
  billingContactEmail: z
    .union([z.literal(''), z.email({ message: 'Billing contact e-mail is not a valid address.' }).max(254)])
    .optional()
    .transform((v) => (v ? v : undefined)),
  barometricPressureKpa: optionalNumber(50, 110, 'Site barometric pressure (kPa)'),
  // US customary accounts give the barometric pressure in psia (50 to 110 kPa); it is stored in kPa.
  barometricPressurePsia: optionalNumber(7.25, 15.95, 'Site barometric pressure (psia)'),
  siteAltitudeM: optionalNumber(-500, 6000, 'Site altitude (m)'),
  unitSystem: z.enum(['si', 'us'], { message: 'Choose SI or US customary units.' }).default('si'),
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{3}$/, { message: 'Currency is a three-letter ISO 4217 code, such as USD or EUR.' })
    .default('USD'),
});
export type AccountInput = z.output<typeof accountInputSchema>;

/** Creating an account may go ahead despite a same-named one when the user confirms it is another company. */
export const accountCreateSchema = accountInputSchema.extend({ confirmDuplicateName: z.boolean().optional() });
export type AccountCreateInput = z.output<typeof accountCreateSchema>;

export const accountUpdateSchema = accountInputSchema.extend({ accountId: z.uuid() });

export const inviteSchema = z.object({
  accountId: z.uuid({ message: 'Choose an account.' }),
  email: z.email({ message: 'Enter a valid e-mail address.' }).max(254),
});
export type InviteInput = z.output<typeof inviteSchema>;

export const acceptInviteSchema = z.object({
  token: mailedTokenSchema,
  name: nameText('your name', 2, 100),
  password: newPasswordSchema,
});

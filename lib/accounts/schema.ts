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
  siteAltitudeM: optionalNumber(-500, 6000, 'Site altitude (m)'),
});
export type AccountInput = z.output<typeof accountInputSchema>;

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

import * as z from 'zod/mini';
import '@/lib/validation/english-messages';
import { mailedTokenSchema, nameText, newPasswordSchema } from '@/lib/auth/schema';

const optionalText = (max: number) =>
  z.pipe(
    z.optional(z.string().check(z.trim(), z.maxLength(max, { message: `At most ${max} characters.` }))),
    z.transform((v) => (v ? v : undefined)),
  );

/** Empty form text reads as absent; other text as a number (a non-number fails the number check below). */
const toOptionalNumber = (v: unknown) =>
  v === '' || v === null || v === undefined ? undefined : typeof v === 'string' ? Number(v) : v;

const optionalNumber = (min: number, max: number, what: string) =>
  z.pipe(
    z.transform(toOptionalNumber),
    z.optional(
      z
        .number({ message: `${what} must be a number.` })
        .check(
          z.gte(min, { message: `${what} must be between ${min} and ${max}.` }),
          z.lte(max, { message: `${what} must be between ${min} and ${max}.` }),
        ),
    ),
  );

/** A customer account as sales engineers create it for a prospect. */
export const accountInputSchema = z.object({
  name: nameText('the company name', 2, 120),
  site: optionalText(160),
  billingContactName: optionalText(120),
  billingContactEmail: z.pipe(
    z.optional(
      z.union([
        z.literal(''),
        z.email({ message: 'Billing contact e-mail is not a valid address.' }).check(z.maxLength(254)),
      ]),
    ),
    z.transform((v) => (v ? v : undefined)),
  ),
  barometricPressureKpa: optionalNumber(50, 110, 'Site barometric pressure (kPa)'),
  // US customary accounts give the barometric pressure in psia (50 to 110 kPa); it is stored in kPa.
  barometricPressurePsia: optionalNumber(7.25, 15.95, 'Site barometric pressure (psia)'),
  siteAltitudeM: optionalNumber(-500, 6000, 'Site altitude (m)'),
  unitSystem: z._default(z.enum(['si', 'us'], { message: 'Choose SI or US customary units.' }), 'si'),
  currency: z._default(
    z
      .string()
      .check(
        z.trim(),
        z.toUpperCase(),
        z.regex(/^[A-Z]{3}$/, { message: 'Currency is a three-letter ISO 4217 code, such as USD or EUR.' }),
      ),
    'USD',
  ),
});
export type AccountInput = z.output<typeof accountInputSchema>;

/** Creating an account may go ahead despite a same-named one when the user confirms it is another company. */
export const accountCreateSchema = z.extend(accountInputSchema, { confirmDuplicateName: z.optional(z.boolean()) });
export type AccountCreateInput = z.output<typeof accountCreateSchema>;

export const accountUpdateSchema = z.extend(accountInputSchema, { accountId: z.uuid() });

export const inviteSchema = z.object({
  accountId: z.uuid({ message: 'Choose an account.' }),
  email: z.email({ message: 'Enter a valid e-mail address.' }).check(z.maxLength(254)),
});
export type InviteInput = z.output<typeof inviteSchema>;

export const acceptInviteSchema = z.object({
  token: mailedTokenSchema,
  name: nameText('your name', 2, 100),
  password: newPasswordSchema,
});

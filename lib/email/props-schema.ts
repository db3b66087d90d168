import { z } from 'zod';
import type { EmailProps, EmailTemplate } from './catalogue';

// Checked when a mail is queued (the caller hears about a bad recipient at once, in its own
// transaction) and again when the worker renders the stored payload (jsonb has no types).
const text = z.string().trim().min(1, 'must not be empty');
const link = z.string().trim().min(1, 'must be an absolute URL or an app path starting with /');
// Names people choose (account, person, quote and sizing titles) reach subject lines and bodies: bounded, and with
// control characters and text-direction overrides turned into spaces, so a name cannot fake a header or reorder
// the words around it. React escapes markup in the body.

const unsafeChars = /[\u0000-\u001f\u007f\u202a-\u202e\u2066-\u2069]/g;
const name = text.max(160, 'must be at most 160 characters').transform((v) => v.replace(unsafeChars, ' '));

export const emailPropsSchemas: { [T in EmailTemplate]: z.ZodType<EmailProps[T]> } = {
  invitation: z.object({
    accountName: name,
    inviterName: name,
    inviteUrl: link,
    expiresInDays: z.number().int().min(1).max(365),
  }),
  'quote-sent': z.object({
    accountName: name,
    quoteNumber: text,
    quoteTitle: name,
    senderName: name,
    quoteUrl: link,
    joinUrl: link.nullable().optional(),
    lines: z
      .array(
        z.object({
          title: text,
          tag: z.string().nullable(),
          headline: z.string(),
          quantity: z.number().int().min(1),
          price: z.string().nullable().optional(),
        }),
      )
      .max(200),
    total: z.string().nullable().optional(),
  }),
  'datasheet-issued': z.object({
    accountName: name,
    datasheetNumber: text,
    revision: text,
    sizingTitle: name,
    equipmentTag: z.string().nullable(),
    datasheetUrl: link,
    copy: z.boolean().optional(),
    supersededBy: z.string().max(2).nullable().optional(),
  }),
  'payment-failed': z.object({ accountName: name, billingUrl: link, graceDays: z.number().int().min(0).max(365) }),
  'subscription-ending': z.object({ accountName: name, periodEnd: text, billingUrl: link }),
  'verify-email': z.object({ name, verifyUrl: link, expiresInHours: z.number().int().min(1).max(720) }),
  'password-reset': z.object({ resetUrl: link, expiresInMinutes: z.number().int().min(1).max(1440) }),
  'account-exists': z.object({ signInUrl: link, resetUrl: link }),
};

export const recipientSchema = z.email('must be a single e-mail address such as name@example.com').max(320);

/** A queued mail whose recipient or props cannot be sent; names the field and the reason. */
export class EmailInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EmailInputError';
  }
}

function describe(issues: readonly z.core.$ZodIssue[], prefix: string): string {
  return issues.map((i) => `${[prefix, ...i.path.map(String)].join('.')} ${i.message}`).join('; ');
}

/** Parses a template's props, throwing EmailInputError that names every bad field. */
export function parseEmailProps<T extends EmailTemplate>(template: T, props: unknown): EmailProps[T] {
  const schema: z.ZodType<EmailProps[T]> | undefined = Object.hasOwn(emailPropsSchemas, template)
    ? emailPropsSchemas[template]
    : undefined;
  if (!schema) throw new EmailInputError(`template: unknown e-mail template "${String(template)}"`);
  const parsed = schema.safeParse(props);
  if (!parsed.success) throw new EmailInputError(`${template} e-mail: ${describe(parsed.error.issues, 'props')}`);
  return parsed.data;
}

export function parseRecipient(to: unknown): string {
  const parsed = recipientSchema.safeParse(to);
  if (!parsed.success)
    throw new EmailInputError(
      `to ${parsed.error.issues[0]?.message ?? 'is not an e-mail address'} (got ${JSON.stringify(to)})`,
    );
  return parsed.data;
}

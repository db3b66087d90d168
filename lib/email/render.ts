import { render, toPlainText } from '@react-email/render';
import { createElement, type ReactElement } from 'react';
import { DatasheetIssuedEmail } from '@/emails/datasheet-issued';
import { InvitationEmail } from '@/emails/invitation';
import { PaymentFailedEmail } from '@/emails/payment-failed';
import { QuoteSentEmail } from '@/emails/quote-sent';
import { SubscriptionEndingEmail } from '@/emails/subscription-ending';
import { AccountExistsEmail } from '@/emails/account-exists';
import { PasswordResetEmail } from '@/emails/password-reset';
import { VerifyEmail } from '@/emails/verify-email';
import { env } from '@/lib/env';
import { subjectFor, type EmailProps, type EmailTemplate } from './catalogue';
import { parseEmailProps } from './props-schema';

export type RenderedEmail = { subject: string; html: string; text: string };

const components: { [T in EmailTemplate]: (props: EmailProps[T]) => ReactElement } = {
  invitation: InvitationEmail,
  'quote-sent': QuoteSentEmail,
  'datasheet-issued': DatasheetIssuedEmail,
  'payment-failed': PaymentFailedEmail,
  'subscription-ending': SubscriptionEndingEmail,
  'verify-email': VerifyEmail,
  'password-reset': PasswordResetEmail,
  'account-exists': AccountExistsEmail,
};

// A link in a mail is opened outside the app, so an app path such as /billing must become absolute.
function absoluteLinks<P extends object>(props: P, appUrl: string): P {
  const out: Record<string, unknown> = { ...(props as Record<string, unknown>) };
  for (const [key, value] of Object.entries(out)) {
    if (key.endsWith('Url') && typeof value === 'string' && value.startsWith('/'))
      out[key] = new URL(value, appUrl).toString();
  }
  return out as P;
}

/**
 * Renders a template to its subject, HTML and plain-text parts. Props are validated first
 * (stored payloads are untyped jsonb); throws EmailInputError naming the bad field.
 */
export async function renderEmail<T extends EmailTemplate>(
  template: T,
  rawProps: unknown,
  appUrl: string = env.APP_URL,
): Promise<RenderedEmail> {
  const props = absoluteLinks(parseEmailProps(template, rawProps), appUrl);
  const component = components[template] as (p: EmailProps[T]) => ReactElement;
  const html = await render(createElement(component, props));
  // One render: the text part is derived from the same HTML, so both always say the same thing.
  const text = toPlainText(html);
  return { subject: subjectFor(template, props), html, text };
}

/** @jsxRuntime automatic */
/** @jsxImportSource react */
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, MailLayout, Para } from './_layout';

type Props = EmailProps['payment-failed'];

/** A subscription payment was declined: what still works, for how long, and how to fix it. */
export function PaymentFailedEmail({ accountName, billingUrl, graceDays }: Props) {
  const grace = `${graceDays} day${graceDays === 1 ? '' : 's'}`;
  return (
    <MailLayout
      preview={`The latest Dutywise payment for ${accountName} did not go through`}
      footerNote={`Sent to the billing contact for ${accountName}.`}
    >
      <Para>Hello,</Para>
      <Para>
        The latest subscription payment for <strong>{accountName}</strong> was declined.
      </Para>
      {graceDays > 0 ? (
        <Para>
          Datasheet downloads stay open for {grace} while the payment is sorted out. After that they are locked until a
          payment succeeds.
        </Para>
      ) : (
        <Para>Datasheet downloads are locked until a payment succeeds.</Para>
      )}
      <Para>Your sizings, quotes and issued datasheets are kept either way.</Para>
      <ActionButton href={billingUrl}>Update payment details</ActionButton>
    </MailLayout>
  );
}

// Invented example for previews only: the demo scenario's vendor and customer (db/seed-scenario.ts), with
// numbers and figures in the formats the app itself writes.
export const paymentFailedPreview: Props = {
  accountName: 'Tarnside Polymers',
  billingUrl: 'http://localhost:3000/billing',
  graceDays: 7,
};

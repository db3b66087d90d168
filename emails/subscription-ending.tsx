/** @jsxRuntime automatic */
/** @jsxImportSource react */
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, FactList, MailLayout, Para } from './_layout';

type Props = EmailProps['subscription-ending'];

/** A cancelled subscription runs to the end of its paid period; say when downloads lock. */
export function SubscriptionEndingEmail({ accountName, periodEnd, billingUrl }: Props) {
  return (
    <MailLayout
      preview={`The Dutywise subscription for ${accountName} ends on ${periodEnd}`}
      footerNote={`Sent to the billing contact for ${accountName}.`}
    >
      <Para>Hello,</Para>
      <Para>
        The subscription for <strong>{accountName}</strong> has been cancelled and ends on <strong>{periodEnd}</strong>.
      </Para>
      <FactList
        facts={[
          { label: 'Account', value: accountName },
          { label: 'Access until', value: periodEnd },
        ]}
      />
      <Para>
        Until then everything works as before. From that date datasheet downloads are locked; sizings, quotes and issued
        datasheets stay on the account.
      </Para>
      <Para>Changed your mind? You can resume the subscription before it ends.</Para>
      <ActionButton href={billingUrl}>Manage the subscription</ActionButton>
    </MailLayout>
  );
}

// Invented example for previews only: the demo scenario's vendor and customer (db/seed-scenario.ts), with
// numbers and figures in the formats the app itself writes.
export const subscriptionEndingPreview: Props = {
  accountName: 'Tarnside Polymers',
  periodEnd: '2026-11-30',
  billingUrl: 'http://localhost:3000/billing',
};

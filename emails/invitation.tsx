/** @jsxRuntime automatic */
/** @jsxImportSource react */
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, FactList, MailLayout, Para } from './_layout';

type Props = EmailProps['invitation'];

/** Someone at the vendor or the customer asks a colleague to join an account. */
export function InvitationEmail({ accountName, inviterName, inviteUrl, expiresInDays }: Props) {
  const days = `${expiresInDays} day${expiresInDays === 1 ? '' : 's'}`;
  return (
    <MailLayout
      preview={`${inviterName} invited you to ${accountName} on Dutywise`}
      footerNote="If you were not expecting this invitation you can ignore it; nothing is set up until you accept."
    >
      <Para>Hello,</Para>
      <Para>
        {inviterName} has invited you to join <strong>{accountName}</strong> on Dutywise, where your team keeps its
        heater and compressor sizings, quotes and datasheets.
      </Para>
      <FactList
        facts={[
          { label: 'Account', value: accountName },
          { label: 'Invited by', value: inviterName },
          { label: 'Link valid for', value: days },
        ]}
      />
      <ActionButton href={inviteUrl}>Accept the invitation</ActionButton>
      <Para>
        The link works once and expires in {days}. After that, ask {inviterName} to send a new one.
      </Para>
    </MailLayout>
  );
}

// Invented example for previews only: the demo scenario's vendor and customer (db/seed-scenario.ts), with
// numbers and figures in the formats the app itself writes.
export const invitationPreview: Props = {
  accountName: 'Tarnside Polymers',
  inviterName: 'Ines Marlow',
  inviteUrl: 'http://localhost:3000/invite/preview-token',
  expiresInDays: 14,
};

/** @jsxRuntime automatic */
/** @jsxImportSource react */
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, MailLayout, Para } from './_layout';

type Props = EmailProps['verify-email'];

/** Confirms that the person who signed up reads this address, before the sign-in can act or get billing mail. */
export function VerifyEmail({ name, verifyUrl, expiresInHours }: Props) {
  return (
    <MailLayout
      preview="Confirm your e-mail address to start using Dutywise"
      footerNote="If you did not create a Dutywise account you can ignore this message; nothing is used until the address is confirmed."
    >
      <Para>Hello {name},</Para>
      <Para>
        Confirm that this is your address to finish setting up your Dutywise sign-in. Until then the account cannot save
        sizings and no billing mail is sent here.
      </Para>
      <ActionButton href={verifyUrl}>Confirm my address</ActionButton>
      <Para>The link works once and expires in {`${expiresInHours} hours`}.</Para>
    </MailLayout>
  );
}

// Invented example for previews only.
export const verifyEmailPreview: Props = {
  name: 'Mina Okafor',
  verifyUrl: 'http://localhost:3000/verify/preview-token',
  expiresInHours: 48,
};

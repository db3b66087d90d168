/** @jsxRuntime automatic */
/** @jsxImportSource react */
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, MailLayout, Para } from './_layout';

type Props = EmailProps['password-reset'];

/** A one-time link to choose a new password; using it signs out every session of the account. */
export function PasswordResetEmail({ resetUrl, expiresInMinutes }: Props) {
  return (
    <MailLayout
      preview="Choose a new Dutywise password"
      footerNote="If you did not ask for this, ignore it: your password stays as it is."
    >
      <Para>Hello,</Para>
      <Para>Someone, probably you, asked to reset the password of the Dutywise sign-in for this address.</Para>
      <ActionButton href={resetUrl}>Choose a new password</ActionButton>
      <Para>
        The link works once and expires in {`${expiresInMinutes} minutes`}. Setting a new password signs out every
        device that is signed in with the old one.
      </Para>
    </MailLayout>
  );
}

// Invented example for previews only.
export const passwordResetPreview: Props = {
  resetUrl: 'http://localhost:3000/reset-password/preview-token',
  expiresInMinutes: 60,
};

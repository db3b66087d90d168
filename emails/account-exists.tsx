/** @jsxRuntime automatic */
/** @jsxImportSource react */
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, MailLayout, Para } from './_layout';

type Props = EmailProps['account-exists'];

/** Someone tried to sign up with an address that already has a sign-in: point the owner at sign-in and reset. */
export function AccountExistsEmail({ signInUrl, resetUrl }: Props) {
  return (
    <MailLayout
      preview="You already have a Dutywise sign-in"
      footerNote="If this was not you, nothing has changed and you can ignore this message."
    >
      <Para>Hello,</Para>
      <Para>
        Someone tried to create a Dutywise account with this address, which already has a sign-in. No new account was
        created.
      </Para>
      <ActionButton href={signInUrl}>Sign in</ActionButton>
      <Para>
        Forgotten the password? <a href={resetUrl}>Choose a new one</a>.
      </Para>
    </MailLayout>
  );
}

// Invented example for previews only.
export const accountExistsPreview: Props = {
  signInUrl: 'http://localhost:3000/sign-in',
  resetUrl: 'http://localhost:3000/forgot-password',
};

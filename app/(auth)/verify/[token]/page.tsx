import type { Metadata } from 'next';
import Link from 'next/link';
import { mailedTokenSchema } from '@/lib/auth/schema';
import { AuthFrame, DeadLink } from '../../_components/auth-frame';
import { safeNextParam, withNext } from '../../_lib/safe-next';
import { ConfirmButton } from './_components/confirm-button';

export const metadata: Metadata = { title: 'Confirm your e-mail address' };
export const dynamic = 'force-dynamic';

export default async function VerifyPage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const token = mailedTokenSchema.safeParse((await params).token);
  const next = safeNextParam((await searchParams).next);
  return (
    <AuthFrame title="Confirm your e-mail address">
      {token.success ? (
        <>
          <p className="mt-2 text-sm text-ink-soft">
            Confirm that the address you signed up with is yours; then sign in with your password.
          </p>
          <ConfirmButton token={token.data} signInHref={withNext('/sign-in', next)} />
        </>
      ) : (
        <DeadLink>
          This link is incomplete. Open it again from the e-mail, or{' '}
          <Link href="/sign-in" className="text-tide-600 underline">
            sign in
          </Link>{' '}
          to have a new one sent.
        </DeadLink>
      )}
    </AuthFrame>
  );
}

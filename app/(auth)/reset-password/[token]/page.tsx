import type { Metadata } from 'next';
import Link from 'next/link';
import { mailedTokenSchema } from '@/lib/auth/schema';
import { peekEmailToken } from '@/lib/auth/local/email-tokens';
import { clerkEnabled } from '@/lib/env';
import { AuthFrame, DeadLink } from '../../_components/auth-frame';
import { ResetForm } from './_components/reset-form';

export const metadata: Metadata = { title: 'Choose a new password' };
export const dynamic = 'force-dynamic';

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const token = mailedTokenSchema.safeParse((await params).token);
  const live = token.success && !clerkEnabled && (await peekEmailToken(token.data, 'reset-password'));
  return (
    <AuthFrame title="Choose a new password">
      {live && token.success ? (
        <ResetForm token={token.data} />
      ) : (
        <DeadLink>
          This link is not valid any more: it was used already, has expired, or is incomplete.{' '}
          <Link href="/forgot-password" className="text-tide-600 underline">
            Ask for a new one
          </Link>
          .
        </DeadLink>
      )}
    </AuthFrame>
  );
}

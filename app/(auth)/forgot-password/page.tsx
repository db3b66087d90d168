import type { Metadata } from 'next';
import Link from 'next/link';
import { clerkEnabled } from '@/lib/env';
import { AuthFrame, DeadLink } from '../_components/auth-frame';
import { ForgotForm } from './_components/forgot-form';

export const metadata: Metadata = { title: 'Reset your password' };
export const dynamic = 'force-dynamic';

export default function ForgotPasswordPage() {
  return (
    <AuthFrame title="Reset your password">
      {clerkEnabled ? (
        <DeadLink>
          Passwords on this installation are reset from the{' '}
          <Link href="/sign-in" className="text-tide-600 underline">
            sign-in form
          </Link>
          .
        </DeadLink>
      ) : (
        <ForgotForm />
      )}
    </AuthFrame>
  );
}

import type { Metadata } from 'next';
import Link from 'next/link';
import { Logo } from '@/app/_components/logo';
import { clerkEnabled } from '@/lib/env';
import { safeNextParam, withNext } from '../_lib/safe-next';
import { ClerkSignUp } from './_components/clerk-sign-up';
import { SignUpForm } from './_components/sign-up-form';

export const metadata: Metadata = { title: 'Create an account' };
export const dynamic = 'force-dynamic';

export default async function SignUpPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  // A prospect coming from the desk keeps their sizing: `next` carries its inputs through the confirmation link to sign-in.
  const next = safeNextParam((await searchParams).next);
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-6 py-12">
      <Link href="/" className="mb-8 flex items-center gap-2 text-xl font-semibold">
        <Logo /> Dutywise
      </Link>
      <h1 className="text-2xl font-semibold">Create your customer account</h1>
      <p className="mt-2 text-sm text-ink-soft">
        One sign-in for you and a customer account for your company: save heater and compressor sizings, see your
        vendor’s quotes and download datasheets.
      </p>
      {clerkEnabled ? <ClerkSignUp /> : <SignUpForm next={next} />}
      <p className="mt-6 text-sm text-ink-muted">
        Already use Dutywise?{' '}
        <Link className="text-tide-600 underline" href={withNext('/sign-in', next)}>
          Sign in
        </Link>
      </p>
    </main>
  );
}

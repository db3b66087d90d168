import type { Metadata } from 'next';
import Link from 'next/link';
import { demoSignIns } from '@/lib/auth/demo-users';
import { HOME_PATH } from '@/lib/auth/home';
import { clerkEnabled, demoMode } from '@/lib/env';
import { AuthFrame } from '../_components/auth-frame';
import { safeNextParam, withNext } from '../_lib/safe-next';
import { ClerkSignIn } from './_components/clerk-sign-in';
import { SignInForm } from './_components/sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

/** The invented scenario's sign-ins and their shared password: shown in demo mode only. */
function DemoSignIns() {
  return (
    <section
      aria-labelledby="demo-users"
      data-testid="demo-sign-ins"
      className="mt-8 rounded-panel border border-paper-line bg-paper-raised p-4 text-sm"
    >
      <h2 id="demo-users" className="font-semibold">
        Demo sign-ins (local identity)
      </h2>
      <table className="mt-2 w-full text-left">
        <tbody>
          {demoSignIns.map((u) => (
            <tr key={u.email} className="border-t border-paper-line">
              <td className="py-1 pr-2 text-ink-muted">{u.label}</td>
              <td className="py-1 font-mono">{u.email}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-hint text-ink-muted">
        Every demo user&apos;s password is <span className="font-mono">{demoSignIns[0]?.password}</span>.
      </p>
    </section>
  );
}

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  // Only paths on this site: another origin, or a backslash or control-character trick, is ignored.
  const asked = safeNextParam((await searchParams).next);
  // With no page asked for, each role lands on its own home.
  const next = asked ?? HOME_PATH;
  return (
    <AuthFrame title="Sign in to your sizing desk">
      {clerkEnabled ? (
        <ClerkSignIn next={next} />
      ) : (
        <>
          <SignInForm next={next} />
          <p className="mt-3 text-sm">
            <Link className="text-tide-600 underline" href="/forgot-password">
              Forgotten your password?
            </Link>
          </p>
          {demoMode && <DemoSignIns />}
        </>
      )}
      <p className="mt-6 text-sm text-ink-muted">
        New customer?{' '}
        <Link className="text-tide-600 underline" href={withNext('/sign-up', asked)} data-testid="create-account-link">
          Create an account
        </Link>
      </p>
    </AuthFrame>
  );
}

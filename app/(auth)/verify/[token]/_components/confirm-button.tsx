'use client';

import Link from 'next/link';
import { useState } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { verifyEmailAction } from '../actions';

/** One press confirms the address (a POST, so mail scanners that open links do not use the token up). */
export function ConfirmButton({ token, signInHref = '/sign-in' }: { token: string; signInHref?: string }) {
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  if (done)
    return (
      <div role="status" data-testid="email-verified" className="mt-6 space-y-3 text-sm">
        <p>Your address is confirmed.</p>
        <Link href={signInHref} className="text-tide-600 underline" data-testid="verified-sign-in">
          Sign in to your desk
        </Link>
      </div>
    );
  return (
    <form
      className="mt-6 space-y-3"
      onSubmit={async (e) => {
        e.preventDefault();
        setPending(true);
        const res = await verifyEmailAction({ token });
        setPending(false);
        if (res.ok) setDone(true);
        else setError(summaryOf(res.errors, 'The address could not be confirmed.'));
      }}
    >
      <FormError message={error} />
      <SubmitButton className="w-full py-2.5" pending={pending} pendingLabel="Confirming…">
        Confirm my e-mail address
      </SubmitButton>
    </form>
  );
}

'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { TextField } from '@/app/_components/text-field';
import { signInErrors } from '../../_lib/field-checks';
import { usePlainForm } from '../../_lib/use-plain-form';

const FIELDS = ['email', 'password'] as const;

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { field, onSubmit: submitWith, submitting } = usePlainForm(FIELDS, signInErrors);

  const onSubmit = submitWith(async (values) => {
    setFormError(null);
    const res = await fetch('/api/auth/sign-in', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ ...values, next }),
    }).catch(() => null);
    if (res?.ok) {
      // The server names the destination, checked against the site's own origin.
      const { redirectTo } = (await res.json().catch(() => ({}))) as { redirectTo?: string };
      router.push(redirectTo ?? '/size');
      router.refresh();
      return;
    }
    const body = (await res?.json().catch(() => null)) as { errors?: { message: string }[] } | null;
    setFormError(body?.errors?.[0]?.message ?? 'Dutywise could not be reached; check your connection and try again.');
  });

  return (
    // method and action keep credentials out of the URL if the form is submitted before it is interactive.
    <form onSubmit={onSubmit} method="post" action="/api/auth/sign-in" noValidate className="mt-6 space-y-4">
      <TextField label="E-mail" type="email" autoComplete="username" {...field('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" {...field('password')} />
      {formError && (
        <p
          data-testid="form-error"
          role="alert"
          className="rounded-md bg-copper-50 px-3 py-2 text-sm text-severity-danger"
        >
          {formError}
        </p>
      )}
      <button
        type="submit"
        disabled={submitting}
        className="w-full rounded-md bg-tide-600 px-4 py-2.5 font-medium text-white hover:bg-tide-700 disabled:opacity-60"
      >
        {submitting ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}

'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { TextField } from '@/app/_components/text-field';
import { signInSchema, type SignInInput } from '@/lib/auth/schema';

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    mode: 'onTouched',
  });

  const onSubmit = handleSubmit(async (values) => {
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
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register('password')}
      />
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
        disabled={formState.isSubmitting}
        className="w-full rounded-md bg-tide-600 px-4 py-2.5 font-medium text-white hover:bg-tide-700 disabled:opacity-60"
      >
        {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}

'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type * as z from 'zod/mini';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { resetPasswordSchema } from '@/lib/auth/schema';
import { resetPasswordAction } from '../actions';

type Values = z.input<typeof resetPasswordSchema>;

export function ResetForm({ token }: { token: string }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(resetPasswordSchema),
    mode: 'onTouched',
    defaultValues: { token, password: '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await resetPasswordAction(values);
    if (res.ok) setDone(true);
    else setFormError(showActionErrors(setError, res.errors, ['password']));
  });
  if (done)
    return (
      <div role="status" data-testid="password-reset-done" className="mt-6 space-y-3 text-sm">
        <p>Your new password is set, and every device signed in with the old one has been signed out.</p>
        <Link href="/sign-in" className="text-tide-600 underline">
          Sign in
        </Link>
      </div>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4" aria-label="Choose a new password">
      <input type="hidden" {...register('token')} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="10 characters to 72 bytes."
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <FormError message={formError} />
      <SubmitButton className="w-full py-2.5" pending={formState.isSubmitting} pendingLabel="Saving…">
        Set the new password
      </SubmitButton>
    </form>
  );
}

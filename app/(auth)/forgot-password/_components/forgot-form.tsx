'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type * as z from 'zod/mini';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { forgotPasswordSchema } from '@/lib/auth/schema';
import { requestPasswordResetAction } from '../actions';

type Values = z.input<typeof forgotPasswordSchema>;

export function ForgotForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(forgotPasswordSchema),
    mode: 'onTouched',
    defaultValues: { email: '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await requestPasswordResetAction(values);
    if (res.ok) setSentTo(res.data.email);
    else setFormError(showActionErrors(setError, res.errors, ['email']));
  });
  if (sentTo)
    return (
      <p role="status" data-testid="reset-sent" className="mt-6 text-sm text-ink-soft">
        If <span className="font-mono">{sentTo}</span> has a Dutywise sign-in, a link to choose a new password is on its
        way. It works once, for an hour.
      </p>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4" aria-label="Reset your password">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <FormError message={formError} />
      <SubmitButton className="w-full py-2.5" pending={formState.isSubmitting} pendingLabel="Sending…">
        Send me a reset link
      </SubmitButton>
    </form>
  );
}

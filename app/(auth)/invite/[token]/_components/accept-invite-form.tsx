'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type * as z from 'zod/mini';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { acceptInviteSchema } from '@/lib/accounts/schema';
import { HOME_PATH } from '@/lib/auth/home';
import { acceptInviteAction } from '../actions';

type Values = z.input<typeof acceptInviteSchema>;

/** Sets a name and password for the invited address; the new member then lands on `next` (each role's home by default). */
export function AcceptInviteForm({ token, email, next = HOME_PATH }: { token: string; email: string; next?: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(acceptInviteSchema),
    mode: 'onTouched',
    defaultValues: { token, name: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await acceptInviteAction(values);
    if (res.ok) {
      router.push(next);
      router.refresh();
    } else {
      setFormError(showActionErrors(setError, res.errors, ['name', 'password']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4" aria-label="Accept the invitation">
      <input type="hidden" {...register('token')} />
      <TextField label="E-mail (from the invitation)" type="email" value={email} readOnly autoComplete="username" />
      <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register('name')} />
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <FormError message={formError} />
      <SubmitButton className="w-full py-2.5" pending={formState.isSubmitting} pendingLabel="Joining…">
        Join the customer account
      </SubmitButton>
    </form>
  );
}

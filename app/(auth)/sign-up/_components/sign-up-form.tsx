'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { signUpSchema, type SignUpInput } from '@/lib/auth/schema';
import { signUpAction } from '../actions';

const FIELDS = ['name', 'email', 'password', 'company', 'site'] as const;

/** `next`: the page to open after the address is confirmed and the person signs in (carried in the mailed link). */
export function SignUpForm({ next }: { next?: string }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    mode: 'onTouched',
    defaultValues: { name: '', email: '', password: '', company: '', site: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await signUpAction({ ...values, next });
    if (res.ok) {
      setSentTo(res.data.email);
    } else {
      setFormError(showActionErrors(setError, res.errors, FIELDS));
    }
  });

  const e = formState.errors;
  if (sentTo)
    return (
      <div
        role="status"
        data-testid="sign-up-sent"
        className="mt-6 rounded-panel border border-tide-100 bg-tide-50 p-4"
      >
        <p className="font-medium">Check your inbox</p>
        <p className="mt-2 text-sm text-ink-soft">
          We have sent a link to <span className="font-mono">{sentTo}</span>. Follow it within 48 hours to confirm the
          address and open your desk. If the address already has a Dutywise sign-in, the message says how to sign in
          instead.
        </p>
      </div>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4" aria-label="Create your customer account">
      <TextField label="Your name" autoComplete="name" error={e.name?.message} {...register('name')} />
      <TextField
        label="Work e-mail"
        type="email"
        autoComplete="email"
        error={e.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="10 characters to 72 bytes."
        error={e.password?.message}
        {...register('password')}
      />
      <TextField label="Company" autoComplete="organization" error={e.company?.message} {...register('company')} />
      <TextField
        label="Site (optional)"
        hint="The plant these duties are for; more sites can be described later."
        error={e.site?.message}
        {...register('site')}
      />
      <FormError message={formError} />
      <SubmitButton className="w-full py-2.5" pending={formState.isSubmitting} pendingLabel="Creating your account…">
        Create customer account
      </SubmitButton>
    </form>
  );
}

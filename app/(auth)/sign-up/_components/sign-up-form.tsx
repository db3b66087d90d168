'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { applyFieldErrors, formErrorText } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { signUpSchema, type SignUpInput } from '@/lib/auth/schema';
import { signUpAction } from '../actions';

const FIELDS = ['name', 'email', 'password', 'company', 'site'] as const;

export function SignUpForm({ next }: { next: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    mode: 'onTouched',
    defaultValues: { name: '', email: '', password: '', company: '', site: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await signUpAction(values);
    if (res.ok) {
      router.push(next);
      router.refresh();
    } else {
      setFormError(formErrorText(res.formError, applyFieldErrors(setError, res.fieldErrors, FIELDS)));
    }
  });

  const e = formState.errors;
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
        hint="At least 10 characters."
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

'use client';

import { useState } from 'react';
import { messagesAt, summaryOf } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { signUpErrors } from '../../_lib/field-checks';
import { usePlainForm } from '../../_lib/use-plain-form';
import { signUpAction } from '../actions';

const FIELDS = ['name', 'email', 'password', 'company', 'site'] as const;

/** `next`: the page to open after the address is confirmed and the person signs in (carried in the mailed link). */
export function SignUpForm({ next }: { next?: string }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { field, onSubmit: submitWith, submitting, setServerErrors } = usePlainForm(FIELDS, signUpErrors);

  const onSubmit = submitWith(async (values) => {
    setFormError(null);
    const res = await signUpAction({ ...values, next });
    if (res.ok) {
      setSentTo(res.data.email);
      return;
    }
    // The server's messages beside their fields; the rest (and any field this form lacks) above the button.
    const placed = Object.fromEntries(FIELDS.map((f) => [f, messagesAt(res.errors, f) || undefined]));
    const unplaced = [...new Set(res.errors.map((x) => x.path))].filter(
      (p) => p && !(FIELDS as readonly string[]).includes(p),
    );
    setServerErrors(placed);
    setFormError(
      [summaryOf(res.errors, 'Some fields need attention.'), ...unplaced.map((p) => messagesAt(res.errors, p))].join(
        ' ',
      ),
    );
  });
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
      <TextField label="Your name" autoComplete="name" {...field('name')} />
      <TextField label="Work e-mail" type="email" autoComplete="email" {...field('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="10 characters to 72 bytes."
        {...field('password')}
      />
      <TextField label="Company" autoComplete="organization" {...field('company')} />
      <TextField
        label="Site (optional)"
        hint="The plant these duties are for; more sites can be described later."
        {...field('site')}
      />
      <FormError message={formError} />
      <SubmitButton className="w-full py-2.5" pending={submitting} pendingLabel="Creating your account…">
        Create customer account
      </SubmitButton>
    </form>
  );
}

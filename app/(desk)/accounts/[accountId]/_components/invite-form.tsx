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
import { inviteSchema } from '@/lib/accounts/schema';
import { inviteMemberAction } from '../actions';

type Values = z.input<typeof inviteSchema>;

/** Invites a customer user; in demo mode the mail is a local fake, so the link is shown here too. */
export function InviteForm({ accountId }: { accountId: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [sent, setSent] = useState<{ email: string; inviteUrl: string | null } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<Values>({
    resolver: zodResolver(inviteSchema),
    mode: 'onTouched',
    defaultValues: { accountId, email: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setSent(null);
    const res = await inviteMemberAction(values);
    if (!res.ok) {
      setFormError(showActionErrors(setError, res.errors, ['email']));
      return;
    }
    setSent(res.data);
    reset({ accountId, email: '' });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-2 space-y-3" aria-label="Invite a member">
      <input type="hidden" {...register('accountId')} />
      <TextField
        label="E-mail of the person to invite"
        type="email"
        autoComplete="off"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <FormError message={formError} />
      {sent && (
        <div
          role="status"
          data-testid="invite-sent"
          className="rounded-md border border-tide-100 bg-tide-50 px-3 py-2 text-sm text-tide-700"
        >
          <p>
            Invitation sent to <strong>{sent.email}</strong>
            {sent.inviteUrl ? '; link (demo mode):' : '. The link in it works once, for 14 days.'}
          </p>
          {sent.inviteUrl && (
            <p className="mt-1 break-all font-mono text-hint">
              <a href={sent.inviteUrl} className="underline" data-testid="invite-link">
                {sent.inviteUrl}
              </a>
            </p>
          )}
        </div>
      )}
      <SubmitButton pending={formState.isSubmitting} pendingLabel="Sending…">
        Send invitation
      </SubmitButton>
    </form>
  );
}

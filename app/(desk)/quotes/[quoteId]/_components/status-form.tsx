'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type * as z from 'zod/mini';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SelectField } from '@/app/_components/select-field';
import { quoteStatusLabels } from '@/app/_components/status-badge';
import { SubmitButton } from '@/app/_components/submit-button';
import { quoteStatuses, quoteStatusSchema } from '@/lib/quotes/schema';
import { setQuoteStatusAction } from '../actions';

type Values = z.input<typeof quoteStatusSchema>;

/** Marks the quote draft, sent, won or lost (sending the e-mail is the separate button). */
export function StatusForm({ quoteId, status }: { quoteId: string; status: Values['status'] }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(quoteStatusSchema),
    defaultValues: { quoteId, status },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await setQuoteStatusAction(values);
    if (!res.ok) setFormError(showActionErrors(setError, res.errors, ['status']));
    else router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Change status">
      <input type="hidden" {...register('quoteId')} />
      <div className="flex flex-wrap items-end gap-3">
        <SelectField
          label="Mark quote as"
          options={quoteStatuses.map((s) => ({ value: s, label: quoteStatusLabels[s] ?? s }))}
          error={formState.errors.status?.message}
          className="w-40"
          {...register('status')}
        />
        <SubmitButton variant="secondary" pending={formState.isSubmitting} pendingLabel="Saving…">
          Change status
        </SubmitButton>
      </div>
      <FormError message={formError} />
    </form>
  );
}

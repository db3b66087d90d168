'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type * as z from 'zod/mini';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SelectField } from '@/app/_components/select-field';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { quoteItemSchema } from '@/lib/quotes/schema';
import { sizingOptionLabel, type SizingOption } from '../../_components/sizing-option';
import { addQuoteLineAction } from '../actions';

type Values = z.input<typeof quoteItemSchema>;

/** Adds one of the account's saved sizings to a draft quote. */
export function AddLineForm({ quoteId, sizings }: { quoteId: string; sizings: SizingOption[] }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<
    Values,
    unknown,
    z.output<typeof quoteItemSchema>
  >({
    resolver: zodResolver(quoteItemSchema),
    mode: 'onTouched',
    defaultValues: { quoteId, sizingId: '', quantity: '1' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await addQuoteLineAction(values);
    if (!res.ok) {
      setFormError(showActionErrors(setError, res.errors, ['sizingId', 'quantity']));
      return;
    }
    reset({ quoteId, sizingId: '', quantity: '1' });
    router.refresh();
  });

  if (!sizings.length)
    return (
      <p className="text-sm text-ink-muted">
        Every sizing saved to this account is already on the quote. Save another sizing to the account to add it.
      </p>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Add a line">
      <input type="hidden" {...register('quoteId')} />
      <div className="flex flex-wrap items-start gap-3">
        <SelectField
          label="Saved sizing"
          options={sizings.map((s) => ({ value: s.id, label: sizingOptionLabel(s) }))}
          placeholder="Choose a sizing of this account"
          error={formState.errors.sizingId?.message}
          className="min-w-72 flex-1"
          {...register('sizingId')}
        />
        <TextField
          label="Quantity"
          type="number"
          inputMode="numeric"
          min={1}
          max={1000}
          step={1}
          error={formState.errors.quantity?.message}
          className="w-28"
          {...register('quantity')}
        />
      </div>
      <FormError message={formError} />
      <SubmitButton pending={formState.isSubmitting} pendingLabel="Adding…">
        Add line
      </SubmitButton>
    </form>
  );
}

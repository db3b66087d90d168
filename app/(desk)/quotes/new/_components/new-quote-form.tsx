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
import { TextareaField } from '@/app/_components/textarea-field';
import { TextField } from '@/app/_components/text-field';
import { quoteCreateSchema, type QuoteCreateInput } from '@/lib/quotes/schema';
import { accountOptionLabel } from '@/lib/accounts/label';
import type { SizingOption } from '../../_components/sizing-option';
import { createQuoteAction } from '../actions';
import { SizingChecklist } from './sizing-checklist';

type Values = z.input<typeof quoteCreateSchema>;
type Props = {
  accounts: { id: string; name: string; site?: string | null; billingContactEmail?: string | null }[];
  accountId: string | null;
  sizings: SizingOption[];
};

/** A new draft quote: the account first (its sizings load from the server), then title, notes and lines. */
export function NewQuoteForm({ accounts, accountId, sizings }: Props) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, setValue, watch, formState } = useForm<Values, unknown, QuoteCreateInput>({
    resolver: zodResolver(quoteCreateSchema),
    mode: 'onTouched',
    defaultValues: { accountId: accountId ?? '', title: '', notes: '', sizingIds: [] },
  });
  const selected = watch('sizingIds') ?? [];
  const account = register('accountId');

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await createQuoteAction({ ...values, notes: values.notes || undefined });
    if (!res.ok) {
      setFormError(showActionErrors(setError, res.errors, ['accountId', 'title', 'notes', 'sizingIds']));
      return;
    }
    router.push(`/quotes/${res.data.id}`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="New quote">
      <SelectField
        label="Customer account"
        options={accounts.map((a) => ({ value: a.id, label: accountOptionLabel(a) }))}
        placeholder="Choose the customer account"
        error={formState.errors.accountId?.message}
        className="max-w-md"
        {...account}
        onChange={async (e) => {
          await account.onChange(e);
          setValue('sizingIds', []);
          // The account's sizings are read on the server, scoped to what this user may see.
          router.replace(e.target.value ? `/quotes/new?accountId=${e.target.value}` : '/quotes/new', { scroll: false });
        }}
      />
      <TextField
        label="Title"
        hint="e.g. Regeneration gas heater and booster compressor"
        error={formState.errors.title?.message}
        {...register('title')}
      />
      <TextareaField
        label="Notes"
        hint="Shown on the quote; up to 4000 characters."
        error={formState.errors.notes?.message}
        {...register('notes')}
      />
      {accountId && (
        <SizingChecklist
          sizings={sizings}
          selected={selected}
          onChange={(ids) => setValue('sizingIds', ids, { shouldValidate: true })}
          error={formState.errors.sizingIds?.message}
        />
      )}
      <FormError message={formError} />
      <SubmitButton pending={formState.isSubmitting} pendingLabel="Creating…">
        Create draft quote
      </SubmitButton>
    </form>
  );
}

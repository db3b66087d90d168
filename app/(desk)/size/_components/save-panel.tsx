'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState, useTransition } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { showActionErrors } from '@/app/_components/action-errors';
import { SelectField } from '@/app/_components/select-field';
import { TextField } from '@/app/_components/text-field';
import { TextareaField } from '@/app/_components/textarea-field';
import type { SizingInput } from '@/lib/engine';
import { sizingMetaSchema } from '@/lib/sizings/schema';
import type { AccountSite, QuoteOption, ReopenedSizing } from '../_lib/account-types';
import { saveSizingAction } from '../actions';
import { SaveOutcome, type Saved } from './save-outcome';

const metaForm = sizingMetaSchema.pick({ title: true, equipmentTag: true, notes: true, quoteId: true });
type MetaValues = z.input<typeof metaForm>;

type Props = {
  input: SizingInput | null;
  accountId: string;
  accounts: readonly AccountSite[];
  quotes: readonly QuoteOption[];
  canQuote: boolean;
  reopened: ReopenedSizing | null;
};

/** Title, tag and notes, an optional draft quote, then the server action that recomputes and stores it. */
export function SavePanel({ input, accountId, accounts, quotes, canQuote, reopened }: Props) {
  const [revisedFromId, setRevisedFromId] = useState(reopened?.revise ? reopened.id : undefined);
  const [saved, setSaved] = useState<Saved | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const [pending, start] = useTransition();
  const { register, handleSubmit, setError, formState } = useForm<MetaValues>({
    resolver: zodResolver(metaForm),
    mode: 'onTouched',
    defaultValues: {
      title: reopened ? (reopened.revise ? reopened.title : `${reopened.title} (copy)`.slice(0, 160)) : '',
      equipmentTag: reopened?.equipmentTag ?? '',
      notes: reopened?.notes ?? '',
      quoteId: '',
    },
  });
  const account = accounts.find((a) => a.id === accountId);
  const accountQuotes = quotes.filter((q) => q.accountId === accountId);
  const onSubmit = handleSubmit((meta) => {
    setFormError(null);
    if (!input) return setFormError('Fix the inputs first: only a sized duty can be saved.');
    if (!account) return setFormError('Choose the customer account in step 1 first.');
    start(async () => {
      const res = await saveSizingAction({ ...meta, accountId, revisedFromId, input });
      if (res.ok) {
        setSaved({ ...res.data, revision: Boolean(revisedFromId) });
        // A later save from this screen revises what was just saved, if this was a revision.
        if (revisedFromId) setRevisedFromId(res.data.id);
        return;
      }
      setFormError(showActionErrors(setError, res.errors, ['title', 'equipmentTag', 'notes', 'quoteId']));
    });
  });
  return (
    <section
      aria-labelledby="save-title"
      className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel print:hidden"
      data-testid="save-panel"
    >
      <h2 id="save-title" className="text-base font-semibold">
        {revisedFromId ? `Save as a revision of ${reopened?.number ?? 'the sizing'}` : 'Save this sizing'}
      </h2>
      <p className="mt-1 text-hint text-ink-muted">
        To{' '}
        {account ? (
          <strong className="text-ink" data-testid="save-account-name">
            {account.name}
          </strong>
        ) : (
          <a className="text-severity-danger underline" href="#step-service">
            no account chosen (step 1)
          </a>
        )}
      </p>
      <form onSubmit={onSubmit} noValidate className="mt-3 space-y-3">
        <TextField
          label="Title"
          data-testid="save-title"
          placeholder="e.g. Dryer air preheater, line 2"
          error={formState.errors.title?.message}
          {...register('title')}
        />
        <TextField
          label="Equipment tag (optional)"
          data-testid="save-tag"
          placeholder="e.g. E-2104"
          error={formState.errors.equipmentTag?.message}
          {...register('equipmentTag')}
        />
        <TextareaField
          label="Notes (optional)"
          rows={2}
          data-testid="save-notes"
          error={formState.errors.notes?.message}
          {...register('notes')}
        />
        {canQuote && (
          <SelectField
            label="Add to draft quote (optional)"
            placeholder={accountQuotes.length ? 'Not on a quote' : 'No draft quotes for this account'}
            options={accountQuotes.map((q) => ({ value: q.id, label: `${q.number} · ${q.title}` }))}
            data-testid="save-quote"
            error={formState.errors.quoteId?.message}
            {...register('quoteId')}
          />
        )}
        {formError && (
          <p
            role="alert"
            data-testid="save-error"
            className="rounded-md bg-copper-50 px-3 py-2 text-sm text-severity-danger"
          >
            {formError}
          </p>
        )}
        <button
          type="submit"
          data-testid="save-submit"
          disabled={pending || !input}
          className="w-full rounded-md bg-tide-600 px-4 py-2 text-sm font-medium text-white hover:bg-tide-700 disabled:cursor-not-allowed disabled:opacity-60"
        >
          {pending ? 'Saving…' : revisedFromId ? 'Save revision' : 'Save sizing'}
        </button>
      </form>
      <SaveOutcome saved={saved} />
      {reopened && (
        <p className="mt-3 text-hint text-ink-muted">
          Opened from {reopened.number} (revision {reopened.revision}).{' '}
          <Link
            className="text-tide-700 underline"
            href={`/size?sizing=${reopened.id}${reopened.revise ? '' : '&revise=1'}`}
          >
            {reopened.revise ? 'Duplicate instead' : 'Revise instead'}
          </Link>
        </p>
      )}
    </section>
  );
}

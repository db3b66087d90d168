'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState, useTransition } from 'react';
import { useForm } from 'react-hook-form';
import { showActionErrors } from '@/app/_components/action-errors';
import { SelectField } from '@/app/_components/select-field';
import { TextField } from '@/app/_components/text-field';
import { TextareaField } from '@/app/_components/textarea-field';
import type { SizingInput } from '@/lib/engine';
import { sizingMetaSchema } from '@/lib/sizings/schema';
import * as z from 'zod/mini';
import '@/lib/validation/english-messages';
import type { AccountSite, QuoteOption, ReopenedSizing } from '../_lib/account-types';
import { saveSizingAction } from '../actions';
import { SaveOutcome, type Saved } from './save-outcome';

const metaForm = z.pick(sizingMetaSchema, { title: true, equipmentTag: true, notes: true, quoteId: true });
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
  const [target, setTarget] = useState(reopened?.revise ? { id: reopened.id, number: reopened.number } : null);
  const revisedFromId = target?.id;
  const [saved, setSaved] = useState<(Saved & { key: string }) | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const [pending, start] = useTransition();
  const { register, handleSubmit, setError, formState, watch } = useForm<MetaValues>({
    resolver: zodResolver(metaForm),
    mode: 'onTouched',
    defaultValues: {
      title: reopened ? (reopened.revise ? reopened.title : `${reopened.title} (copy)`.slice(0, 160)) : '',
      equipmentTag: reopened?.equipmentTag ?? '',
      notes: reopened?.notes ?? '',
      quoteId: '',
    },
  });
  // What a save would store; the button stays disarmed while it equals what was just saved.
  const key = JSON.stringify([accountId, input, watch()]);
  const unchanged = saved?.key === key;
  const account = accounts.find((a) => a.id === accountId);
  const accountQuotes = quotes.filter((q) => q.accountId === accountId);
  const save = (asRevision: boolean) =>
    handleSubmit((meta) => {
      setFormError(null);
      if (unchanged) return;
      if (!input) return setFormError('Fix the inputs first: only a sized duty can be saved.');
      if (!account) return setFormError('Choose the customer account in step 1 first.');
      start(async () => {
        const res = await saveSizingAction({
          ...meta,
          accountId,
          revisedFromId: asRevision ? revisedFromId : undefined,
          input,
        });
        if (res.ok) {
          setSaved({ ...res.data, key });
          // A later save from this screen makes a new version of what was just saved, not a second record.
          setTarget({ id: res.data.id, number: res.data.number });
          return;
        }
        setFormError(showActionErrors(setError, res.errors, ['title', 'equipmentTag', 'notes', 'quoteId']));
      });
    });
  const onSubmit = save(Boolean(revisedFromId));
  return (
    <section
      aria-labelledby="save-title"
      className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel print:hidden"
      data-testid="save-panel"
    >
      <h2 id="save-title" className="text-base font-semibold">
        {target ? `Save as a revision of ${target.number}` : 'Save this sizing'}
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
          disabled={pending || !input || unchanged}
          className="w-full rounded-md bg-tide-600 px-4 py-2 text-sm font-medium text-white hover:bg-tide-700 disabled:cursor-not-allowed disabled:opacity-60"
        >
          {pending ? 'Saving…' : unchanged ? 'Saved' : revisedFromId ? 'Save revision' : 'Save sizing'}
        </button>
        {target && !unchanged && (
          <button
            type="button"
            data-testid="save-as-new"
            disabled={pending || !input}
            onClick={save(false)}
            className="w-full rounded-md border border-tide-600 px-4 py-1.5 text-sm text-tide-700 hover:bg-tide-50 disabled:opacity-60"
          >
            Save as a new sizing instead
          </button>
        )}
        <SaveOutcome saved={saved} />
      </form>
      {reopened && (
        <p className="mt-3 text-hint text-ink-muted">
          Opened from {reopened.number} (version {reopened.revision}).{' '}
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

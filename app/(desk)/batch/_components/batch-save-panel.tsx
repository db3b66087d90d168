'use client';

import { useState } from 'react';
import type { BatchTarget } from '@/lib/batch/schema';
import { accountOptionLabel } from '@/lib/accounts/label';

type Props = {
  accounts: { id: string; name: string; site?: string | null; billingContactEmail?: string | null }[];
  quotes: { id: string; number: string; title: string; accountId: string }[];
  canQuote: boolean;
  fixedAccountId: string | null;
  sized: number;
  withProblems: number;
  pending: boolean;
  /** The rows of this check were saved: saving again needs a new check. */
  used: boolean;
  onSave: (t: BatchTarget) => void;
};

/** Where the sized rows go: an account and, for vendor staff, a new or existing draft quote. */
export function BatchSavePanel({
  accounts,
  quotes,
  canQuote,
  fixedAccountId,
  sized,
  withProblems,
  pending,
  used,
  onSave,
}: Props) {
  // No account is chosen for the user: saving a sheet to the wrong customer is worse than one more click.
  const [accountId, setAccountId] = useState(fixedAccountId ?? '');
  const [quoteId, setQuoteId] = useState('');
  const [title, setTitle] = useState('');
  const open = quotes.filter((q) => q.accountId === accountId);
  return (
    <form
      className="flex flex-wrap items-end gap-3 rounded-panel border border-paper-line bg-paper-raised p-4"
      onSubmit={(e) => {
        e.preventDefault();
        onSave({
          accountId,
          quoteId: quoteId || undefined,
          newQuoteTitle: !quoteId && title.trim() ? title.trim() : undefined,
        });
      }}
    >
      {!fixedAccountId && (
        <label className="text-label">
          Customer account
          <select
            className="mt-1 block rounded border border-paper-line px-2 py-1.5"
            value={accountId}
            onChange={(e) => {
              setAccountId(e.target.value);
              setQuoteId('');
            }}
            data-testid="batch-account"
            required
          >
            <option value="" disabled>
              Choose the customer account…
            </option>
            {accounts.map((a) => (
              <option key={a.id} value={a.id}>
                {accountOptionLabel(a)}
              </option>
            ))}
          </select>
        </label>
      )}
      {canQuote && (
        <>
          <label className="text-label">
            Add to draft quote
            <select
              className="mt-1 block rounded border border-paper-line px-2 py-1.5"
              value={quoteId}
              onChange={(e) => setQuoteId(e.target.value)}
            >
              <option value="">New quote…</option>
              {open.map((q) => (
                <option key={q.id} value={q.id}>
                  {q.number} {q.title}
                </option>
              ))}
            </select>
          </label>
          {!quoteId && (
            <label className="text-label">
              New quote title
              <input
                className="mt-1 block rounded border border-paper-line px-2 py-1.5"
                value={title}
                onChange={(e) => setTitle(e.target.value)}
                placeholder="Enquiry of 3 March"
                data-testid="batch-quote-title"
              />
            </label>
          )}
        </>
      )}
      <button
        type="submit"
        disabled={pending || used || !sized || !accountId}
        className="rounded-md bg-copper-500 px-4 py-2 font-medium text-white hover:bg-copper-600 disabled:opacity-50"
        data-testid="batch-save"
      >
        {pending ? 'Saving…' : used ? 'Saved' : `Save the ${sized} rows that passed`}
      </button>
      {!accountId && !used && (
        <p className="w-full text-hint text-ink-muted">Choose the customer account the sizings belong to.</p>
      )}
      {withProblems > 0 && (
        <p className="w-full text-hint text-ink-muted">
          {withProblems} rows with problems will not be saved unless you fix them and check again.
        </p>
      )}
    </form>
  );
}

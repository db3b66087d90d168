'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { setQuoteLinePriceAction } from '../actions';
import { messagesAt, summaryOf } from '@/app/_components/action-errors';

type Props = { quoteId: string; itemId: string; unitPrice: string | null; currency: string; label: string };

/** Sets or clears one draft line's unit price; a refusal (bad number, quote no longer draft) is said beside it. */
export function LinePriceForm({ quoteId, itemId, unitPrice, currency, label }: Props) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [value, setValue] = useState(unitPrice ?? '');
  const [error, setError] = useState<string | null>(null);
  const save = () =>
    start(async () => {
      setError(null);
      const res = await setQuoteLinePriceAction({ quoteId, itemId, unitPrice: value });
      if (res.ok) router.refresh();
      else setError(messagesAt(res.errors, 'unitPrice') || summaryOf(res.errors, 'The price was not saved.'));
    });
  return (
    <form
      className="flex items-center justify-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        save();
      }}
    >
      <span className="text-hint text-ink-muted">{currency}</span>
      <input
        value={value}
        onChange={(e) => setValue(e.target.value)}
        inputMode="decimal"
        placeholder="not priced"
        aria-label={`Unit price of ${label} (${currency})`}
        aria-invalid={error ? true : undefined}
        className="w-28 rounded border border-paper-line px-2 py-1 text-right font-mono text-sm"
      />
      <button type="submit" disabled={pending} className="text-sm underline disabled:opacity-60">
        {pending ? 'Saving…' : 'Save'}
      </button>
      {error && (
        <p data-testid="form-error" role="alert" className="text-hint text-severity-danger">
          {error}
        </p>
      )}
    </form>
  );
}

'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import { removeQuoteLineAction } from '../actions';

/** Removes one line from a draft quote; a refusal (quote no longer draft) is said beside the button. */
export function RemoveLineButton({ quoteId, itemId, label }: { quoteId: string; itemId: string; label: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const remove = () =>
    start(async () => {
      setError(null);
      const res = await removeQuoteLineAction({ quoteId, itemId });
      if (res.ok) router.refresh();
      else setError(summaryOf(res.errors, 'The line was not removed.'));
    });
  return (
    <div>
      <button
        type="button"
        onClick={remove}
        disabled={pending}
        aria-label={`Remove line ${label}`}
        className="text-sm text-severity-danger underline disabled:opacity-60"
      >
        {pending ? 'Removing…' : 'Remove'}
      </button>
      {error && (
        <p data-testid="form-error" role="alert" className="mt-1 text-hint text-severity-danger">
          {error}
        </p>
      )}
    </div>
  );
}

'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { bindQuotePdfAction } from '../actions';

/** Puts the sent quote and its current datasheets together as one PDF, saying whether a new edition was made. */
export function BindPdfButton({ quoteId }: { quoteId: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const bind = () =>
    start(async () => {
      setError(null);
      setNotice(null);
      const res = await bindQuotePdfAction({ quoteId });
      if (res.ok) {
        const { edition, pageCount, created } = res.data;
        setNotice(
          created
            ? `Edition ${edition} bound: ${pageCount} pages.`
            : `Nothing changed since edition ${edition}; it is still the current quote PDF.`,
        );
        router.refresh();
      } else setError(summaryOf(res.errors, 'The quote PDF was not bound.'));
    });
  return (
    <div className="space-y-3">
      <SubmitButton type="button" onClick={bind} pending={pending} pendingLabel="Binding…">
        Bind the quote PDF
      </SubmitButton>
      <FormNotice message={notice} testId="quote-pdf-bound" />
      <FormError message={error} />
    </div>
  );
}

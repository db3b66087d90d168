'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { sendQuoteAction } from '../actions';

type Props = { quoteId: string; to: string | null; alreadySent: boolean; lineCount: number };

/** Sends the quote to the customer account's billing contact, saying to whom before and after. */
export function SendQuoteButton({ quoteId, to, alreadySent, lineCount }: Props) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  const send = () =>
    start(async () => {
      setError(null);
      setSent(null);
      const res = await sendQuoteAction({ quoteId });
      if (res.ok) {
        setSent(
          res.data.invited
            ? `Quote sent to ${res.data.to}, with an invitation to join the account (no Dutywise sign-in yet).`
            : `Quote sent to ${res.data.to}.`,
        );
        router.refresh();
      } else setError(summaryOf(res.errors, 'The quote was not sent.'));
    });
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-soft">
        {to ? (
          <>
            Goes to the billing contact <strong className="font-mono">{to}</strong> with a link to this page; a contact
            with no Dutywise sign-in yet is invited to join the account.
          </>
        ) : (
          <>This customer account has no billing contact e-mail. Add one on the account page before sending.</>
        )}
        {lineCount === 0 && ' Add at least one line first.'}
      </p>
      <SubmitButton
        type="button"
        onClick={send}
        pending={pending}
        pendingLabel="Sending…"
        disabled={!to || lineCount === 0}
      >
        {alreadySent ? 'Send to customer again' : 'Send to customer'}
      </SubmitButton>
      <FormNotice message={sent} testId="quote-sent" />
      <FormError message={error} />
    </div>
  );
}

'use client';

import { useState, useTransition } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import { resendDatasheetEmailAction } from '../actions';

/** Support: send the latest datasheet e-mail to the account contact again. */
export function ResendButton({ sizingId }: { sizingId: string }) {
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <div className="flex flex-wrap items-center gap-3">
      <button
        type="button"
        disabled={pending}
        data-testid="resend-datasheet-email"
        className="rounded-md border border-tide-600 px-3 py-1.5 text-sm text-tide-700 hover:bg-tide-50 disabled:opacity-60"
        onClick={() =>
          start(async () => {
            const res = await resendDatasheetEmailAction({ sizingId });
            setMessage(
              res.ok
                ? {
                    ok: true,
                    text: `Queued to ${res.data.to} (${res.data.datasheetNumber} rev. ${res.data.revision}).`,
                  }
                : { ok: false, text: summaryOf(res.errors, 'Could not resend.') },
            );
          })
        }
      >
        {pending ? 'Queuing…' : 'Resend datasheet e-mail'}
      </button>
      {message && (
        <span
          role="status"
          data-testid="resend-result"
          className={message.ok ? 'text-sm text-tide-700' : 'text-sm text-severity-danger'}
        >
          {message.text}
        </span>
      )}
    </div>
  );
}

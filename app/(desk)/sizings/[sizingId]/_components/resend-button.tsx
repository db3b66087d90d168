'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { resendDatasheetEmailAction } from '../actions';

type Props = {
  sizingId: string;
  /** Revisions in issue order; the latest is chosen first. */
  revisions: { id: string; revision: string; status: string }[];
  billingContact: string | null;
};

/** Support: send a copy of a chosen revision's datasheet notice to the billing contact or another address. */
export function ResendButton({ sizingId, revisions, billingContact }: Props) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [revisionId, setRevisionId] = useState(revisions.at(-1)?.id ?? '');
  const [to, setTo] = useState(billingContact ?? '');
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const field = 'rounded-md border border-paper-line bg-paper px-2 py-1 text-sm';
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        start(async () => {
          const res = await resendDatasheetEmailAction({ sizingId, revisionId, to });
          setMessage(
            res.ok
              ? {
                  ok: true,
                  text: `Copy queued to ${res.data.to} (${res.data.datasheetNumber} rev. ${res.data.revision}).`,
                }
              : {
                  ok: false,
                  text: res.errors.map((e) => e.message).join(' ') || 'Could not resend.',
                },
          );
          if (res.ok) router.refresh();
        });
      }}
    >
      <label className="flex flex-col text-label text-ink-soft">
        Revision
        <select
          className={field}
          value={revisionId}
          data-testid="resend-revision"
          onChange={(e) => setRevisionId(e.target.value)}
        >
          {revisions.map((r) => (
            <option key={r.id} value={r.id}>
              {r.revision} ({r.status.toLowerCase()})
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col text-label text-ink-soft">
        Send to
        <input
          type="email"
          className={`${field} w-72`}
          value={to}
          data-testid="resend-to"
          placeholder="name@example.com"
          onChange={(e) => setTo(e.target.value)}
        />
      </label>
      <button
        type="submit"
        disabled={pending}
        data-testid="resend-datasheet-email"
        className="rounded-md border border-tide-600 px-3 py-1.5 text-sm text-tide-700 hover:bg-tide-50 disabled:opacity-60"
      >
        {pending ? 'Queuing…' : 'Send a copy'}
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
    </form>
  );
}

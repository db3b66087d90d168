'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useState, useTransition } from 'react';
import { issueDatasheetAction } from '@/app/(desk)/datasheets/actions';
import { messagesAt, summaryOf } from '@/app/_components/action-errors';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextareaField } from '@/app/_components/textarea-field';
import { nextRevisionLetter } from '@/lib/datasheets/revision-letter';

type Props = {
  sizingId: string;
  /** The latest issued letter, or null/absent before the first issue. */
  latestRevision?: string | null;
};

/** Issues a sizing's datasheet (or its next revision) with an optional revision note, and says what was issued. */
export function IssueDatasheetButton({ sizingId, latestRevision }: Props) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [latest, setLatest] = useState<string | null>(latestRevision ?? null);
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string | undefined>();
  const [error, setError] = useState<string | null>(null);
  const [issued, setIssued] = useState<string | null>(null);

  // A page refresh after an issue brings the new letter down; keep the button in step with it.
  useEffect(() => {
    setLatest(latestRevision ?? null);
  }, [latestRevision]);

  const issue = () =>
    start(async () => {
      setError(null);
      setIssued(null);
      setNoteError(undefined);
      const res = await issueDatasheetAction({ sizingId, note: note.trim() || undefined });
      if (res.ok) {
        setIssued(`Issued ${res.data.number} revision ${res.data.revision}.`);
        setLatest(res.data.revision);
        setNote('');
        router.refresh();
      } else {
        setNoteError(messagesAt(res.errors, 'note') || undefined);
        setError(summaryOf(res.errors, 'The datasheet was not issued.'));
      }
    });

  const next = latest ? nextRevisionLetter(latest) : null;
  return (
    <div className="space-y-3" data-testid="issue-datasheet">
      <TextareaField
        label="Revision note (optional)"
        hint="Printed in the revision table, e.g. what changed since the last revision. Up to 500 characters."
        rows={2}
        maxLength={500}
        value={note}
        onChange={(e) => setNote(e.target.value)}
        error={noteError}
      />
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton type="button" onClick={issue} pending={pending} pendingLabel="Issuing…">
          {latest ? 'Issue next revision' : 'Issue datasheet'}
        </SubmitButton>
        {latest && (
          <span className="text-sm text-ink-muted">
            {next ? `Revision ${next} follows ${latest}; ${latest} stays as issued.` : 'Every revision letter is used.'}
          </span>
        )}
      </div>
      <FormNotice message={issued} testId="datasheet-issued" />
      <FormError message={error} />
    </div>
  );
}

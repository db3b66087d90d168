'use client';

import { SubmitButton } from '@/app/_components/submit-button';

/** "Change Kai Patel from Sales engineer to Support?" with Confirm and Cancel: nothing changes until confirmed. */
export function ConfirmStep({
  question,
  confirmLabel,
  pending,
  danger,
  onConfirm,
  onCancel,
}: {
  question: string;
  confirmLabel: string;
  pending: boolean;
  danger?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  return (
    <div
      role="alertdialog"
      aria-label={question}
      className="space-y-2 rounded-md border border-paper-line bg-paper p-2"
      data-testid="confirm-step"
    >
      <p className="text-sm">{question}</p>
      <div className="flex gap-2">
        <SubmitButton
          type="button"
          variant={danger ? 'danger' : 'primary'}
          pending={pending}
          className="px-3 py-1.5"
          onClick={onConfirm}
          data-testid="confirm-yes"
        >
          {confirmLabel}
        </SubmitButton>
        <button type="button" className="px-2 text-sm text-tide-600 underline" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </div>
  );
}

import type { ReactNode } from 'react';

type Props = {
  inputId: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  testKey: string;
  children: ReactNode;
  className?: string;
};

/** Label above, control, one-line hint, then the inline error; ids tie hint and error to the control. */
export function FieldFrame({ inputId, label, hint, error, testKey, children, className = '' }: Props) {
  return (
    <div className={className}>
      <label htmlFor={inputId} className="block text-label text-ink-soft">
        {label}
      </label>
      <div className="mt-1">{children}</div>
      {hint && (
        <p id={`${inputId}-hint`} className="mt-1 text-hint text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p
          id={`${inputId}-error`}
          data-testid={`error-${testKey}`}
          className="mt-1 flex gap-1 text-hint font-medium text-severity-danger"
        >
          <svg viewBox="0 0 12 12" aria-hidden="true" className="mt-px h-3 w-3 shrink-0">
            <path d="M6 1 11 10H1Z" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinejoin="round" />
            <path d="M6 4.5v2.5M6 8.4v.1" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
          </svg>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}

/** aria-describedby for a control with this frame. */
export function describedBy(inputId: string, hint: unknown, error: unknown): string | undefined {
  return [hint ? `${inputId}-hint` : null, error ? `${inputId}-error` : null].filter(Boolean).join(' ') || undefined;
}

export const inputClass = (error: unknown) =>
  `block w-full min-w-0 scroll-mt-20 rounded-md border bg-paper-raised px-3 py-2 font-mono text-sm text-ink tabular shadow-sm placeholder:text-ink-muted focus:border-tide-500 ${
    error ? 'border-severity-danger' : 'border-paper-line'
  }`;

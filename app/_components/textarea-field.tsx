import { forwardRef, useId, type TextareaHTMLAttributes } from 'react';

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; hint?: string; error?: string };

/** A labelled multi-line input with its hint and inline error tied to it. */
export const TextareaField = forwardRef<HTMLTextAreaElement, Props>(function TextareaField({ label, hint, error, className, rows = 4, ...rest }, ref) {
  const id = useId();
  const describedBy = [hint && !error ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-label text-ink-soft">
        {label}
      </label>
      <textarea
        id={id}
        ref={ref}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`mt-1 block w-full rounded-md border bg-paper-raised px-3 py-2 text-ink shadow-sm focus:border-tide-500 ${error ? 'border-severity-danger' : 'border-paper-line'}`}
        {...rest}
      />
      {hint && !error && (
        <p id={`${id}-hint`} className="mt-1 text-hint text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="mt-1 text-hint text-severity-danger">
          {error}
        </p>
      )}
    </div>
  );
});

import { forwardRef, useId, type InputHTMLAttributes } from 'react';

type Props = InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string; error?: string };

/** A labelled input with its hint and inline error tied to it for assistive technology. */
export const TextField = forwardRef<HTMLInputElement, Props>(function TextField({ label, hint, error, className, ...rest }, ref) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-label text-ink-soft">
        {label}
      </label>
      <input
        id={id}
        ref={ref}
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

import { forwardRef, useId, type SelectHTMLAttributes } from 'react';

type Option = { value: string; label: string };
type Props = SelectHTMLAttributes<HTMLSelectElement> & { label: string; options: readonly Option[]; placeholder?: string; hint?: string; error?: string };

/** A labelled select with its hint and inline error tied to it for assistive technology. */
export const SelectField = forwardRef<HTMLSelectElement, Props>(function SelectField({ label, options, placeholder, hint, error, className, ...rest }, ref) {
  const id = useId();
  const describedBy = [hint && !error ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-label text-ink-soft">
        {label}
      </label>
      <select
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`mt-1 block w-full rounded-md border bg-paper-raised px-3 py-2 text-ink shadow-sm focus:border-tide-500 ${error ? 'border-severity-danger' : 'border-paper-line'}`}
        {...rest}
      >
        {placeholder !== undefined && <option value="">{placeholder}</option>}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
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

import { useId, type ReactNode } from 'react';

export type FieldWiring = {
  id: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
  className: string;
};

/**
 * The label, hint and inline error around one form control, with the ids that tie them together for
 * assistive technology. `children` receives the props the control must spread.
 */
export function LabelledControl({
  label,
  hint,
  error,
  className,
  children,
}: {
  label: string;
  hint?: string;
  error?: string;
  className?: string;
  children: (wiring: FieldWiring) => ReactNode;
}) {
  const id = useId();
  const describedBy =
    [hint && !error ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  const controlClass = `mt-1 block w-full rounded-md border bg-paper-raised px-3 py-2 text-ink shadow-sm focus:border-tide-500 ${error ? 'border-severity-danger' : 'border-paper-line'}`;
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-label text-ink-soft">
        {label}
      </label>
      {children({
        id,
        'aria-invalid': error ? true : undefined,
        'aria-describedby': describedBy,
        className: controlClass,
      })}
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
}

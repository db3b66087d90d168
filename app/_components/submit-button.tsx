import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger';
type Props = ButtonHTMLAttributes<HTMLButtonElement> & { pending?: boolean; pendingLabel?: string; variant?: Variant };

const variants: Record<Variant, string> = {
  primary: 'bg-tide-600 text-white hover:bg-tide-700',
  secondary: 'border border-paper-line bg-paper-raised text-ink hover:bg-paper-sunk',
  danger: 'border border-severity-danger/40 bg-paper-raised text-severity-danger hover:bg-copper-50',
};

/** A button that says what it is doing while the server works, and cannot be pressed twice. */
export function SubmitButton({
  pending,
  pendingLabel,
  variant = 'primary',
  className = '',
  children,
  type = 'submit',
  disabled,
  ...rest
}: Props) {
  return (
    <button
      type={type}
      disabled={pending || disabled}
      aria-busy={pending || undefined}
      className={`inline-flex items-center justify-center rounded-md px-4 py-2 text-sm font-medium disabled:cursor-not-allowed disabled:opacity-60 ${variants[variant]} ${className}`}
      {...rest}
    >
      {pending ? (pendingLabel ?? 'Working…') : children}
    </button>
  );
}

/** Link styled as a button, for "New …" entry points in page headers. */
export const buttonLinkClass =
  'inline-flex items-center rounded-md bg-tide-600 px-4 py-2 text-sm font-medium text-white hover:bg-tide-700';

import type { ReactElement } from 'react';
import type { Severity } from '@/lib/engine';

// Four shapes so severity never rests on colour alone: an octagon with a bar (danger), a triangle
// with a stroke and dot (warning), a diamond with a dot (caution) and a circle with a stem (note).
const SHAPES: Record<Severity, ReactElement> = {
  danger: (
    <>
      <path d="M5.5 1h5L15 5.5v5L10.5 15h-5L1 10.5v-5Z" fill="currentColor" />
      <path d="M4.5 8h7" stroke="white" strokeWidth="2" strokeLinecap="round" />
    </>
  ),
  warning: (
    <>
      <path d="M8 1.5 15 14H1Z" fill="currentColor" strokeLinejoin="round" />
      <path d="M8 6v3.8" stroke="white" strokeWidth="1.8" strokeLinecap="round" />
      <circle cx="8" cy="12" r="1" fill="white" />
    </>
  ),
  caution: (
    <>
      <path d="M8 1 15 8 8 15 1 8Z" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinejoin="round" />
      <circle cx="8" cy="8" r="2" fill="currentColor" />
    </>
  ),
  info: (
    <>
      <circle cx="8" cy="8" r="6.5" fill="none" stroke="currentColor" strokeWidth="1.6" />
      <path d="M8 7v4.5" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
      <circle cx="8" cy="4.6" r="1" fill="currentColor" />
    </>
  ),
};

export const SEVERITY_TEXT: Record<Severity, string> = {
  danger: 'text-severity-danger',
  warning: 'text-severity-warning',
  caution: 'text-severity-caution',
  info: 'text-severity-info',
};

/** The severity's own mark, in its colour. */
export function SeverityIcon({ severity, className = 'h-4 w-4' }: { severity: Severity; className?: string }) {
  return (
    <svg viewBox="0 0 16 16" aria-hidden="true" className={`${className} shrink-0 ${SEVERITY_TEXT[severity]}`}>
      {SHAPES[severity]}
    </svg>
  );
}

import type { ReactNode } from 'react';

type Props = { label: string; value: string; unit?: string; testId?: string; note?: ReactNode };

/** One labelled figure in the side panel's grid. */
export function KeyFigure({ label, value, unit, testId, note }: Props) {
  return (
    <div className="min-w-0">
      <dt className="text-hint text-ink-muted">{label}</dt>
      <dd className="font-mono text-sm tabular text-ink">
        <span data-testid={testId}>{value}</span>
        {unit && <span className="ml-1 text-ink-soft">{unit}</span>}
        {note && <span className="block font-sans text-hint text-ink-muted">{note}</span>}
      </dd>
    </div>
  );
}

export function KeyFigures({ children }: { children: ReactNode }) {
  return <dl className="grid grid-cols-2 gap-x-4 gap-y-3">{children}</dl>;
}

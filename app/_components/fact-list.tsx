import type { ReactNode } from 'react';

/** Label/value pairs as a definition list, with an optional free-text notes block below. */
export function FactList({
  rows,
  notes,
  testId,
}: {
  rows: readonly (readonly [string, ReactNode])[];
  notes?: string | null;
  testId?: string;
}) {
  const list = (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]" data-testid={testId}>
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-muted">{k}</dt>
          <dd className="tabular text-ink">{v}</dd>
        </div>
      ))}
    </dl>
  );
  if (notes === undefined) return list;
  return (
    <div className="space-y-4">
      {list}
      {notes && (
        <div>
          <h3 className="text-label uppercase tracking-wide text-ink-muted">Notes</h3>
          <p className="mt-1 whitespace-pre-wrap text-sm text-ink">{notes}</p>
        </div>
      )}
    </div>
  );
}

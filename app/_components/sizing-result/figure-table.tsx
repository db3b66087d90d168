import type { ReactNode } from 'react';

export type FigureRow = {
  label: ReactNode;
  value: string;
  unit?: string;
  testId?: string;
  note?: ReactNode;
  strong?: boolean;
};

/** A two-column table of labelled figures, numbers right-aligned in tabular digits. */
export function FigureTable({
  caption,
  rows,
  testId,
}: {
  caption: string;
  rows: readonly FigureRow[];
  testId?: string;
}) {
  return (
    <table className="w-full text-sm" data-testid={testId}>
      <caption className="mb-1 text-left text-label uppercase tracking-wide text-ink-muted">{caption}</caption>
      <tbody>
        {rows.map((r, i) => (
          <tr key={i} className={`border-t border-paper-line ${r.strong ? 'font-semibold' : ''}`}>
            <th scope="row" className="py-1.5 pr-3 text-left align-top font-normal text-ink-soft">
              {r.label}
              {r.note && <span className="block text-hint text-ink-muted">{r.note}</span>}
            </th>
            <td className="whitespace-nowrap py-1.5 text-right align-top font-mono tabular">
              <span data-testid={r.testId}>{r.value}</span>
              {r.unit && <span className="ml-1 text-ink-muted">{r.unit}</span>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** A titled block in the result details. */
export function DetailCard({
  title,
  id,
  children,
  className = '',
}: {
  title: string;
  id: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <section
      aria-labelledby={id}
      className={`break-inside-avoid rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel print:shadow-none ${className}`}
    >
      <h2 id={id} className="mb-3 text-base font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

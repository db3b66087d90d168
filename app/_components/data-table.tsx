import type { ReactNode } from 'react';

export type Column<T> = {
  key: string;
  header: string;
  cell: (row: T) => ReactNode;
  /** Right-aligned with tabular figures. */
  numeric?: boolean;
  className?: string;
};

type Props<T> = {
  caption: string;
  columns: readonly Column<T>[];
  rows: readonly T[];
  rowKey: (row: T) => string;
  empty: ReactNode;
  testId?: string;
};

/** A dense, readable table for lists of accounts, quotes, sizings, people and audit entries. */
export function DataTable<T>({ caption, columns, rows, rowKey, empty, testId }: Props<T>) {
  if (!rows.length) return <>{empty}</>;
  return (
    <div className="overflow-x-auto rounded-panel border border-paper-line bg-paper-raised">
      <table className="w-full border-collapse text-left text-sm" data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk text-label text-ink-soft">
          <tr>
            {columns.map((c) => (
              <th key={c.key} scope="col" className={`px-3 py-2 font-medium ${c.numeric ? 'text-right' : ''}`}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-t border-paper-line align-top hover:bg-paper/60">
              {columns.map((c) => (
                <td key={c.key} className={`px-3 py-2 ${c.numeric ? 'tabular text-right' : ''} ${c.className ?? ''}`}>
                  {c.cell(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** The link style used inside tables and detail lists. */
export const tableLinkClass =
  'font-medium text-tide-600 underline decoration-tide-100 underline-offset-2 hover:decoration-tide-600';

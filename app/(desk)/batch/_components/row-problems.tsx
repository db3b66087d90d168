'use client';

import type { BatchRowView } from '@/lib/batch/view';

/** A row's problems, each with its cell to correct in place. */
export function RowProblems({
  row: r,
  edits,
  onEdit,
}: {
  row: BatchRowView;
  edits: Record<number, Record<string, string>>;
  onEdit: (row: number, column: string, value: string) => void;
}) {
  if (!r.problems.length) return null;
  return (
    <ul className="space-y-1">
      {r.problems.map((p) => (
        <li key={p.column + p.message}>
          <label className="flex flex-wrap items-center gap-2 text-severity-danger">
            <span>
              <span className="font-mono">{p.column}</span>: {p.message}
            </span>
            <input
              aria-label={`Line ${r.row} ${p.column}`}
              className="w-32 rounded border border-paper-line px-2 py-0.5 text-ink"
              defaultValue={edits[r.row]?.[p.column] ?? r.cells[p.column] ?? ''}
              onChange={(e) => onEdit(r.row, p.column, e.target.value)}
            />
          </label>
        </li>
      ))}
    </ul>
  );
}

'use client';

import type { BatchRow } from '@/lib/batch/evaluate';

const kw = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 });

function headline(r: BatchRow): string {
  if (!r.result) return '—';
  return r.result.service === 'heater'
    ? `${kw.format(r.result.heater.designDutyKw)} kW design`
    : `${kw.format(r.result.compressor.shaftPowerKw)} kW shaft`;
}

/** Every row with its figure or its problems; a problem cell can be corrected in place. */
export function BatchRowsTable({
  rows,
  edits,
  onEdit,
}: {
  rows: BatchRow[];
  edits: Record<number, Record<string, string>>;
  onEdit: (row: number, column: string, value: string) => void;
}) {
  return (
    <div className="max-h-[32rem] overflow-auto rounded-panel border border-paper-line bg-paper-raised">
      <table className="w-full text-left text-sm" data-testid="batch-rows">
        <thead className="sticky top-0 bg-paper-sunk text-label text-ink-soft">
          <tr>
            <th className="px-3 py-2">Row</th>
            <th className="px-3 py-2">Tag</th>
            <th className="px-3 py-2">Title</th>
            <th className="px-3 py-2">Service</th>
            <th className="px-3 py-2 text-right">Result</th>
            <th className="px-3 py-2">Problems (fix and re-check)</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr
              key={r.row}
              className={`border-t border-paper-line align-top ${r.problems.length ? 'bg-copper-50' : ''}`}
              data-testid={r.problems.length ? 'batch-row-error' : 'batch-row-ok'}
            >
              <td className="px-3 py-2 tabular">{r.row}</td>
              <td className="px-3 py-2 font-mono">{r.meta.equipmentTag ?? '—'}</td>
              <td className="px-3 py-2">{r.meta.title ?? '—'}</td>
              <td className="px-3 py-2">{r.cells.service ?? ''}</td>
              <td className="px-3 py-2 text-right tabular">{headline(r)}</td>
              <td className="px-3 py-2">
                <ul className="space-y-1">
                  {r.problems.map((p) => (
                    <li key={p.column + p.message}>
                      <label className="flex flex-wrap items-center gap-2 text-severity-danger">
                        <span>
                          <span className="font-mono">{p.column}</span>: {p.message}
                        </span>
                        <input
                          aria-label={`Row ${r.row} ${p.column}`}
                          className="w-32 rounded border border-paper-line px-2 py-0.5 text-ink"
                          defaultValue={edits[r.row]?.[p.column] ?? r.cells[p.column] ?? ''}
                          onChange={(e) => onEdit(r.row, p.column, e.target.value)}
                        />
                      </label>
                    </li>
                  ))}
                </ul>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

'use client';

import { useState } from 'react';
import { formatKw } from '@/app/_components/sizing-result/quantity-format';
import { localiseText } from '@/app/_components/sizing-result/localise-text';
import type { BatchRowView } from '@/lib/batch/view';
import type { UnitSystem } from '@/lib/units';
import { RowProblems } from './row-problems';

const PAGE = 200;

function headline(r: BatchRowView): string {
  return r.headline ? `${formatKw(r.headline.kw)} kW ${r.headline.basis}` : '—';
}

/** Every row with its figure, its warnings or its problems; a problem cell can be corrected in place. */
export function BatchRowsTable({
  rows,
  edits,
  unitSystem,
  onEdit,
}: {
  rows: BatchRowView[];
  edits: Record<number, Record<string, string>>;
  unitSystem: UnitSystem;
  onEdit: (row: number, column: string, value: string) => void;
}) {
  const attention = rows.filter((r) => r.problems.length || r.warnings.length);
  const [onlyAttention, setOnlyAttention] = useState(rows.length > PAGE && attention.length > 0);
  const [shown, setShown] = useState(PAGE);
  const list = onlyAttention ? attention : rows;
  return (
    <div className="space-y-2">
      {attention.length > 0 && attention.length < rows.length && (
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={onlyAttention} onChange={(e) => setOnlyAttention(e.target.checked)} />
          Show only the {attention.length.toLocaleString('en-US')} rows with problems or warnings
        </label>
      )}
      <div className="max-h-[32rem] overflow-auto rounded-panel border border-paper-line bg-paper-raised">
        <table className="w-full text-left text-sm" data-testid="batch-rows">
          <thead className="sticky top-0 bg-paper-sunk text-label text-ink-soft">
            <tr>
              <th className="px-3 py-2">Line</th>
              <th className="px-3 py-2">Tag</th>
              <th className="px-3 py-2">Title</th>
              <th className="px-3 py-2">Service</th>
              <th className="px-3 py-2 text-right">Result</th>
              <th className="px-3 py-2">Warnings, or problems to fix before checking again</th>
            </tr>
          </thead>
          <tbody>
            {list.slice(0, shown).map((r) => (
              <tr
                key={r.row}
                className={`border-t border-paper-line align-top ${r.problems.length ? 'bg-copper-50' : ''}`}
                data-testid={r.problems.length ? 'batch-row-error' : 'batch-row-ok'}
                data-row={r.row}
              >
                <td className="px-3 py-2 tabular">{r.row}</td>
                <td className="px-3 py-2 font-mono">{r.meta.equipmentTag ?? '—'}</td>
                <td className="px-3 py-2">{r.meta.title ?? '—'}</td>
                <td className="px-3 py-2">{r.service ?? r.cells.service ?? ''}</td>
                <td className="px-3 py-2 text-right tabular">{headline(r)}</td>
                <td className="px-3 py-2">
                  {r.warnings.length > 0 && (
                    <ul className="space-y-1" data-testid="batch-row-warnings">
                      {r.warnings.map((w) => (
                        <li key={w.code} className="text-severity-warning">
                          <span className="font-medium">{w.severity === 'danger' ? 'Danger' : 'Warning'}:</span>{' '}
                          {localiseText(w.message, unitSystem)}
                        </li>
                      ))}
                    </ul>
                  )}
                  <RowProblems row={r} edits={edits} onEdit={onEdit} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {list.length > shown && (
        <button type="button" className="text-sm text-tide-700 underline" onClick={() => setShown((s) => s + PAGE)}>
          Show {Math.min(PAGE, list.length - shown)} more of {list.length.toLocaleString('en-US')} rows
        </button>
      )}
    </div>
  );
}

import { EmptyState } from '@/app/_components/empty-state';
import { flattenJson } from './flatten-json';

const INDENT_REM = 1.25;

/** Saved JSON (sizing input or engine result) as an indented key/value table; no shape is assumed. */
export function KeyValueTable({ caption, data, testId }: { caption: string; data: unknown; testId?: string }) {
  const { rows, truncated } = flattenJson(data);
  if (!rows.length) return <EmptyState title={`No ${caption.toLowerCase()} saved`} />;
  return (
    <div className="overflow-x-auto rounded-panel border border-paper-line">
      <table className="w-full border-collapse text-left text-sm" data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk text-label text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Item
            </th>
            <th scope="col" className="px-3 py-2 text-right font-medium">
              Value
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Unit
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) =>
            r.value === null ? (
              <tr key={r.path} className="border-t border-paper-line bg-paper/60">
                <th
                  scope="colgroup"
                  colSpan={3}
                  className="px-3 py-1.5 font-semibold text-ink"
                  style={{ paddingLeft: `${0.75 + r.depth * INDENT_REM}rem` }}
                  title={r.path}
                >
                  {r.label}
                </th>
              </tr>
            ) : (
              <tr key={r.path} className="border-t border-paper-line">
                <th
                  scope="row"
                  className="px-3 py-1.5 font-normal text-ink-soft"
                  style={{ paddingLeft: `${0.75 + r.depth * INDENT_REM}rem` }}
                  title={r.path}
                >
                  {r.label}
                </th>
                <td className="tabular px-3 py-1.5 text-right font-mono text-ink">{r.value}</td>
                <td className="px-3 py-1.5 text-ink-muted">{r.unit ?? ''}</td>
              </tr>
            ),
          )}
        </tbody>
      </table>
      {truncated && (
        <p className="px-3 py-2 text-hint text-severity-caution">Long record: only the first rows are shown.</p>
      )}
    </div>
  );
}

import { formatDateTime } from '@/app/_components/format';
import { formatHeadline } from '@/lib/sizings/headline';
import { inputChanges, type VersionChange } from '@/lib/sizings/version-diff';
import type { SizingVersionView } from '@/lib/sizings/versions';

function headlineChanges(older: SizingVersionView, newer: SizingVersionView, service: Service): VersionChange[] {
  const rows: VersionChange[] = [
    { label: 'Title', before: older.title, after: newer.title },
    { label: 'Equipment tag', before: older.equipmentTag ?? '—', after: newer.equipmentTag ?? '—' },
    { label: 'Gas', before: older.gasLabel, after: newer.gasLabel },
    {
      label: 'Headline',
      before: formatHeadline(service, older.headlineKw),
      after: formatHeadline(service, newer.headlineKw),
    },
    {
      label: 'Mass flow (kg/h)',
      before: (older.massFlowKgPerS * 3600).toFixed(1),
      after: (newer.massFlowKgPerS * 3600).toFixed(1),
    },
  ];
  return rows.filter((r) => r.before !== r.after);
}

type Service = 'heater' | 'compressor';

function ChangeTable({ caption, rows, testId }: { caption: string; rows: VersionChange[]; testId: string }) {
  if (!rows.length) return null;
  return (
    <table className="mt-2 w-full text-left text-sm" data-testid={testId}>
      <caption className="text-left text-label text-ink-soft">{caption}</caption>
      <thead className="text-label text-ink-soft">
        <tr>
          <th className="w-1/3">What</th>
          <th>Before</th>
          <th>After</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.label} className="border-t border-paper-line">
            <td className="py-1 font-mono text-hint">{r.label}</td>
            <td className="tabular">{r.before}</td>
            <td className="tabular font-medium">{r.after}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The record's versions, newest first, each with what changed from the one before it. */
export function VersionHistory({ versions, service }: { versions: SizingVersionView[]; service: Service }) {
  if (versions.length < 2)
    return <p className="text-sm text-ink-muted">Version 1 is the only version; revising the sizing adds the next.</p>;
  return (
    <ol className="space-y-4" data-testid="sizing-versions">
      {versions.map((v, i) => {
        const older = versions[i + 1];
        return (
          <li key={v.version} className="rounded-md border border-paper-line p-3" data-testid={`version-${v.version}`}>
            <p className="text-sm">
              <strong>Version {v.version}</strong>
              {v.current ? ' (current)' : ' (superseded)'} · saved {formatDateTime(v.savedAt)} by {v.savedByName ?? '—'}{' '}
              · {formatHeadline(service, v.headlineKw)}
            </p>
            {older ? (
              <>
                <ChangeTable
                  caption={`Headline figures, version ${older.version} to ${v.version}`}
                  rows={headlineChanges(older, v, service)}
                  testId={`version-${v.version}-figures`}
                />
                <ChangeTable
                  caption={`Inputs changed, version ${older.version} to ${v.version}`}
                  rows={inputChanges(older.input, v.input)}
                  testId={`version-${v.version}-inputs`}
                />
              </>
            ) : (
              <p className="text-hint text-ink-muted">First version.</p>
            )}
          </li>
        );
      })}
    </ol>
  );
}

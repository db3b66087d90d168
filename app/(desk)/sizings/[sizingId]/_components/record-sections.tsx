import { formatDateTime } from '@/app/_components/format';
import type { DatasheetSummary } from '@/lib/datasheets/queries';
import { revisionStatus } from '@/lib/datasheets/revision-letter';
import type { EmailLogEntry } from '@/lib/email/queries';
import type { TrailEntry } from '@/lib/support/sizing-record';

/** Every issued revision of the sizing's datasheet, oldest first, with its hash. */
export function RevisionList({
  datasheet,
  canDownload,
}: {
  datasheet: DatasheetSummary | undefined;
  canDownload: boolean;
}) {
  if (!datasheet) return <p className="text-sm text-ink-muted">No datasheet has been issued for this sizing.</p>;
  return (
    <table className="w-full text-left text-sm" data-testid="datasheet-revisions">
      <caption className="mb-2 text-left font-mono">{datasheet.number}</caption>
      <thead className="text-label text-ink-soft">
        <tr>
          <th>Rev.</th>
          <th>Status</th>
          <th>Issued (UTC)</th>
          <th>By</th>
          <th>Note</th>
          <th>SHA-256</th>
          <th />
        </tr>
      </thead>
      <tbody>
        {datasheet.revisions.map((r, i) => (
          <tr key={r.id} className="border-t border-paper-line">
            <td className="py-1 font-mono">{r.revision}</td>
            <td data-testid="revision-status" className={i < datasheet.revisions.length - 1 ? 'text-ink-muted' : ''}>
              {revisionStatus(datasheet.revisions, i)}
            </td>
            <td>{formatDateTime(r.issuedAt)}</td>
            <td>{r.issuedByName ?? '—'}</td>
            <td>{r.note ?? '—'}</td>
            <td className="font-mono text-hint">{r.sha256.slice(0, 16)}…</td>
            <td>
              {canDownload && (
                <a className="text-tide-700 underline" href={`/api/v1/datasheets/${r.id}`}>
                  PDF
                </a>
              )}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function EmailLog({ emails }: { emails: EmailLogEntry[] }) {
  if (!emails.length) return <p className="text-sm text-ink-muted">No e-mail has been sent about this datasheet.</p>;
  return (
    <ul className="divide-y divide-paper-line text-sm" data-testid="email-log">
      {emails.map((e) => (
        <li key={e.id} className="py-1.5">
          <span className="font-medium">{e.subject}</span> to {e.to} · {e.status}
          {e.sentAt ? ` ${formatDateTime(e.sentAt)}` : ''}
          {e.lastError && e.status !== 'sent' ? <span className="text-severity-warning"> · {e.lastError}</span> : null}
        </li>
      ))}
    </ul>
  );
}

export function AuditTrail({ entries }: { entries: TrailEntry[] }) {
  return (
    <ol className="space-y-1 text-sm" data-testid="audit-trail">
      {entries.map((e) => (
        <li key={e.id}>
          <span className="tabular text-ink-muted">{formatDateTime(e.at)}</span> ·{' '}
          <span className="font-mono">{e.action}</span> · {e.actorName ?? 'system'}
          {e.actorRole ? ` (${e.actorRole.replace('_', ' ')})` : ''}
        </li>
      ))}
    </ol>
  );
}

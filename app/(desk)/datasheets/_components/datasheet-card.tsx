import Link from 'next/link';
import { formatDate } from '@/app/_components/format';
import type { DatasheetSummary } from '@/lib/datasheets/queries';
import { revisionStatus } from '@/lib/datasheets/revision-letter';
import { LockedCard } from './locked-card';

const kb = (bytes: number) => `${Math.max(1, Math.round(bytes / 1024))} kB`;

/** One datasheet: its identity, every revision with date and hash prefix, and downloads or the locked preview. */
export function DatasheetCard({
  ds,
  unlocked,
  showAccount,
}: {
  ds: DatasheetSummary;
  unlocked: boolean;
  showAccount: boolean;
}) {
  const latest = ds.revisions.at(-1) ?? null;
  return (
    <article
      id={ds.number}
      aria-labelledby={`${ds.id}-title`}
      className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel"
    >
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={`${ds.id}-title`} className="text-lg font-semibold text-ink">
          <span className="font-mono">{ds.number}</span>{' '}
          <Link href={`/sizings/${ds.sizingId}`} className="underline decoration-paper-line underline-offset-4">
            {ds.sizingTitle}
          </Link>
        </h2>
        <p className="text-sm text-ink-soft">
          {ds.equipmentTag && <span className="font-mono">{ds.equipmentTag}</span>}
          {ds.equipmentTag && ' · '}
          {ds.service === 'heater' ? 'Gas heater' : 'Gas compressor'}
          {showAccount && <> · {ds.accountName}</>}
        </p>
      </header>
      <table className="mt-3 w-full text-sm">
        <caption className="sr-only">Revisions of {ds.number}</caption>
        <thead className="text-left text-label text-ink-muted">
          <tr>
            <th className="py-1 pr-3">Rev.</th>
            <th className="py-1 pr-3">Status</th>
            <th className="py-1 pr-3">Issued</th>
            <th className="py-1 pr-3">Note</th>
            <th className="py-1 pr-3">By</th>
            <th className="py-1 pr-3">SHA-256</th>
            {unlocked && (
              <th className="py-1">
                <span className="sr-only">Download</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {ds.revisions.map((r, i) => (
            <tr key={r.id} className="border-t border-paper-line align-top">
              <td className="py-1.5 pr-3 font-mono font-semibold">{r.revision}</td>
              <td data-testid="revision-status" className="py-1.5 pr-3 text-ink-soft">
                {revisionStatus(ds.revisions, i)}
              </td>
              <td className="py-1.5 pr-3 tabular">{formatDate(r.issuedAt)}</td>
              <td className="py-1.5 pr-3 text-ink-soft">{r.note ?? '—'}</td>
              <td className="py-1.5 pr-3 text-ink-soft">{r.issuedByName ?? '—'}</td>
              <td className="py-1.5 pr-3 font-mono text-ink-muted" title={r.sha256}>
                {r.sha256.slice(0, 12)}…
              </td>
              {unlocked && (
                <td className="py-1.5">
                  <a
                    href={`/api/v1/datasheets/${r.id}`}
                    download
                    data-testid="datasheet-download"
                    className="text-tide-600 underline"
                  >
                    Download PDF ({kb(r.byteSize)})
                  </a>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
      {!unlocked && (
        <div className="mt-3">
          <LockedCard
            title={ds.sizingTitle}
            tag={ds.equipmentTag}
            number={ds.number}
            revision={latest?.revision ?? null}
          />
        </div>
      )}
    </article>
  );
}

import Link from 'next/link';
import type { ReactNode } from 'react';
import { tableLinkClass } from '@/app/_components/data-table';
import { formatDateTime } from '@/app/_components/format';
import { ServiceBadge } from '@/app/_components/status-badge';
import { formatHeadline } from '@/lib/sizings/headline';
import type { SizingDetail } from '@/lib/sizings/queries';

/** The saved sizing's identity and headline as a definition list. */
export function SizingMeta({ sizing, linkAccount }: { sizing: SizingDetail; linkAccount: boolean }) {
  const rows: [string, ReactNode][] = [
    ['Sizing number', <span key="n" className="font-mono" data-testid="sizing-number">{sizing.number}</span>],
    ['Revision', sizing.revision],
    ['Equipment tag', sizing.equipmentTag ? <span key="t" className="font-mono">{sizing.equipmentTag}</span> : '—'],
    ['Customer account', linkAccount ? <Link key="a" href={`/accounts/${sizing.accountId}`} className={tableLinkClass}>{sizing.accountName}</Link> : sizing.accountName],
    ['Service', <ServiceBadge key="s" service={sizing.service} />],
    ['Gas', sizing.gasLabel],
    ['Headline', <strong key="h" className="tabular">{formatHeadline(sizing.service, sizing.headlineKw)}</strong>],
    ['Created by', sizing.createdByName ?? '—'],
    ['Created', formatDateTime(sizing.createdAt)],
    ['Engine version', <span key="e" className="font-mono">{sizing.engineVersion}</span>],
  ];
  return (
    <div className="space-y-4">
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]" data-testid="sizing-meta">
        {rows.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-muted">{k}</dt>
            <dd className="tabular text-ink">{v}</dd>
          </div>
        ))}
      </dl>
      {sizing.notes && (
        <div>
          <h3 className="text-label uppercase tracking-wide text-ink-muted">Notes</h3>
          <p className="mt-1 whitespace-pre-wrap text-sm text-ink">{sizing.notes}</p>
        </div>
      )}
    </div>
  );
}

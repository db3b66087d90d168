import Link from 'next/link';
import type { ReactNode } from 'react';
import { DataTable, tableLinkClass, type Column } from '@/app/_components/data-table';
import { formatDate } from '@/app/_components/format';
import { ServiceBadge } from '@/app/_components/status-badge';
import { formatHeadline } from '@/lib/sizings/headline';
import type { SizingSummary } from '@/lib/sizings/queries';

const columns: Column<SizingSummary>[] = [
  {
    key: 'number',
    header: 'Sizing',
    cell: (s) => (
      <Link href={`/sizings/${s.id}`} className={`${tableLinkClass} font-mono`}>
        {s.number}
      </Link>
    ),
  },
  { key: 'title', header: 'Title', cell: (s) => s.title },
  {
    key: 'tag',
    header: 'Equipment tag',
    cell: (s) => (s.equipmentTag ? <span className="font-mono">{s.equipmentTag}</span> : '—'),
  },
  { key: 'account', header: 'Customer account', cell: (s) => s.accountName },
  { key: 'service', header: 'Service', cell: (s) => <ServiceBadge service={s.service} /> },
  { key: 'gas', header: 'Gas', cell: (s) => s.gasLabel },
  { key: 'headline', header: 'Headline', numeric: true, cell: (s) => formatHeadline(s.service, s.headlineKw) },
  { key: 'created', header: 'Saved', numeric: true, cell: (s) => formatDate(s.createdAt) },
];

/** Saved sizings as a dense list; the caller says what to show when there are none. */
export function SizingsTable({
  sizings,
  empty,
  hideAccount = false,
}: {
  sizings: SizingSummary[];
  empty: ReactNode;
  hideAccount?: boolean;
}) {
  const cols = hideAccount ? columns.filter((c) => c.key !== 'account') : columns;
  return (
    <DataTable
      caption="Saved sizings"
      columns={cols}
      rows={sizings}
      rowKey={(s) => s.id}
      empty={empty}
      testId="sizings-table"
    />
  );
}

import Link from 'next/link';
import type { ReactNode } from 'react';
import { DataTable, tableLinkClass, type Column } from '@/app/_components/data-table';
import { formatDate } from '@/app/_components/format';
import { QuoteStatusBadge } from '@/app/_components/status-badge';
import type { QuoteSummary } from '@/lib/quotes/queries';

const columns: Column<QuoteSummary>[] = [
  {
    key: 'number',
    header: 'Quote',
    cell: (q) => (
      <Link href={`/quotes/${q.id}`} className={`${tableLinkClass} font-mono`}>
        {q.number}
      </Link>
    ),
  },
  { key: 'title', header: 'Title', cell: (q) => q.title },
  { key: 'account', header: 'Customer account', cell: (q) => q.accountName },
  { key: 'status', header: 'Status', cell: (q) => <QuoteStatusBadge status={q.status} /> },
  { key: 'lines', header: 'Lines', numeric: true, cell: (q) => q.itemCount },
  { key: 'created', header: 'Created', numeric: true, cell: (q) => formatDate(q.createdAt) },
  { key: 'sent', header: 'Sent', numeric: true, cell: (q) => formatDate(q.sentAt) },
];

/** Quotes as a dense list; the caller says what to show when there are none. */
export function QuotesTable({
  quotes,
  empty,
  hideAccount = false,
}: {
  quotes: QuoteSummary[];
  empty: ReactNode;
  hideAccount?: boolean;
}) {
  const cols = hideAccount ? columns.filter((c) => c.key !== 'account') : columns;
  return (
    <DataTable caption="Quotes" columns={cols} rows={quotes} rowKey={(q) => q.id} empty={empty} testId="quotes-table" />
  );
}

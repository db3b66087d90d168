import Link from 'next/link';
import { DataTable, tableLinkClass, type Column } from '@/app/_components/data-table';
import { EmptyState } from '@/app/_components/empty-state';
import { ServiceBadge } from '@/app/_components/status-badge';
import type { QuoteLine } from '@/lib/quotes/queries';
import { quoteTotals } from '@/lib/quotes/totals';
import { formatHeadline } from '@/lib/sizings/headline';
import { RemoveLineButton } from './remove-line-button';

/** The quote's lines: one saved sizing each, with the quantity quoted. */
export function QuoteLines({ quoteId, lines, editable }: { quoteId: string; lines: QuoteLine[]; editable: boolean }) {
  const columns: Column<QuoteLine>[] = [
    {
      key: 'number',
      header: 'Sizing',
      cell: (l) => (
        <Link href={`/sizings/${l.sizingId}`} className={`${tableLinkClass} font-mono`}>
          {l.sizingNumber}
        </Link>
      ),
    },
    { key: 'title', header: 'Title', cell: (l) => l.title },
    {
      key: 'tag',
      header: 'Equipment tag',
      cell: (l) => (l.equipmentTag ? <span className="font-mono">{l.equipmentTag}</span> : '—'),
    },
    { key: 'service', header: 'Service', cell: (l) => <ServiceBadge service={l.service} /> },
    { key: 'gas', header: 'Gas', cell: (l) => l.gasLabel },
    { key: 'headline', header: 'Headline', numeric: true, cell: (l) => formatHeadline(l.service, l.headlineKw) },
    { key: 'quantity', header: 'Qty', numeric: true, cell: (l) => l.quantity },
  ];
  if (editable) {
    columns.push({
      key: 'remove',
      header: 'Remove',
      cell: (l) => <RemoveLineButton quoteId={quoteId} itemId={l.itemId} label={`${l.sizingNumber} ${l.title}`} />,
    });
  }
  const totals = quoteTotals(lines);
  const parts = (['heater', 'compressor'] as const)
    .filter((service) => totals[service].units > 0)
    .map(
      (service) =>
        `${service === 'heater' ? 'heaters' : 'compressors'}, ${totals[service].units} ${totals[service].units === 1 ? 'unit' : 'units'}: ${formatHeadline(service, totals[service].kw)}`,
    );
  return (
    <>
      <DataTable
        caption="Quote lines"
        columns={columns}
        rows={lines}
        rowKey={(l) => l.itemId}
        testId="quote-lines"
        empty={
          <EmptyState title="No lines on this quote yet">
            {editable ? 'Add a saved sizing of this account below.' : null}
          </EmptyState>
        }
      />
      {parts.length > 0 && (
        <p className="mt-3 text-sm text-ink" data-testid="quote-totals">
          <span className="font-medium">Quoted quantities in total</span>: {parts.join('; ')}.
        </p>
      )}
    </>
  );
}

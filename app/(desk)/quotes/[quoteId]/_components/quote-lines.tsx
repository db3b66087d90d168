import Link from 'next/link';
import { DataTable, tableLinkClass, type Column } from '@/app/_components/data-table';
import { EmptyState } from '@/app/_components/empty-state';
import { ServiceBadge } from '@/app/_components/status-badge';
import { formatMoney, formatPriceTotal, priceCents, priceTotals } from '@/lib/quotes/prices';
import type { QuoteLine } from '@/lib/quotes/queries';
import { quoteTotals } from '@/lib/quotes/totals';
import { formatHeadline } from '@/lib/sizings/headline';
import { LinePriceForm } from './line-price-form';
import { RemoveLineButton } from './remove-line-button';

type Props = { quoteId: string; lines: QuoteLine[]; currency: string; editable: boolean };

const lineAmount = (l: QuoteLine, currency: string) =>
  l.unitPrice === null ? '—' : formatMoney(priceCents(l.unitPrice)! * l.quantity, currency);

/** The quote's lines: one saved sizing each, with the quantity quoted and its optional price. */
export function QuoteLines({ quoteId, lines, currency, editable }: Props) {
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
    {
      key: 'unitPrice',
      header: 'Unit price',
      numeric: true,
      cell: (l) =>
        editable ? (
          <LinePriceForm
            quoteId={quoteId}
            itemId={l.itemId}
            unitPrice={l.unitPrice}
            currency={currency}
            label={`${l.sizingNumber} ${l.title}`}
          />
        ) : l.unitPrice === null ? (
          '—'
        ) : (
          formatMoney(priceCents(l.unitPrice)!, currency)
        ),
    },
    { key: 'amount', header: 'Amount', numeric: true, cell: (l) => lineAmount(l, currency) },
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
  const priceTotal = formatPriceTotal(priceTotals(lines), currency);
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
      {priceTotal && (
        <p className="mt-1 text-sm text-ink" data-testid="quote-price-total">
          <span className="font-medium">Price in total</span>: {priceTotal}.
        </p>
      )}
    </>
  );
}

import type { ReactNode } from 'react';
import { FactList } from '@/app/_components/fact-list';
import Link from 'next/link';
import { tableLinkClass } from '@/app/_components/data-table';
import { formatDateTime } from '@/app/_components/format';
import { QuoteStatusBadge } from '@/app/_components/status-badge';
import type { QuoteDetail } from '@/lib/quotes/queries';

/** The quote's identity, customer account and history as a definition list. */
export function QuoteSummary({ quote, linkAccount }: { quote: QuoteDetail; linkAccount: boolean }) {
  const rows: [string, ReactNode][] = [
    [
      'Quote number',
      <span key="n" className="font-mono" data-testid="quote-number">
        {quote.number}
      </span>,
    ],
    ['Status', <QuoteStatusBadge key="s" status={quote.status} />],
    [
      'Customer account',
      linkAccount ? (
        <Link key="a" href={`/accounts/${quote.accountId}`} className={tableLinkClass}>
          {quote.accountName}
        </Link>
      ) : (
        quote.accountName
      ),
    ],
    ['Billing contact', quote.billingContactEmail ?? '—'],
    ['Prepared by', quote.createdByName ?? '—'],
    ['Created', formatDateTime(quote.createdAt)],
    ['Sent', formatDateTime(quote.sentAt)],
  ];
  return <FactList rows={rows} notes={quote.notes} />;
}

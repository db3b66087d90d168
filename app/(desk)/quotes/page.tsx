import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/app/_components/empty-state';
import { PageBody, PageHeader } from '@/app/_components/page-header';
import { QuotesTable } from '@/app/_components/quotes/quotes-table';
import { firstParam, type SearchParams } from '@/app/_components/route-guards';
import { buttonLinkClass } from '@/app/_components/submit-button';
import { listAccountOptions } from '@/lib/accounts/queries';
import { requirePageUser } from '@/lib/auth/guards';
import { can, isStaff } from '@/lib/auth/roles';
import { listQuotes } from '@/lib/quotes/queries';
import { quoteFilterSchema } from '@/lib/quotes/schema';
import { QuoteFilters } from './_components/quote-filters';

export const metadata: Metadata = { title: 'Quotes' };

export default async function QuotesPage({ searchParams }: { searchParams: SearchParams }) {
  const sp = await searchParams;
  const user = await requirePageUser('/quotes', 'quote:read');
  // Malformed filters fall back to "any" (the schema catches them) rather than failing the page.
  const filter = quoteFilterSchema.parse({
    status: firstParam(sp.status) || undefined,
    accountId: firstParam(sp.accountId) || undefined,
    q: firstParam(sp.q) || undefined,
  });
  const staff = isStaff(user.role);
  const [quotes, accounts] = await Promise.all([
    listQuotes(user, filter),
    staff ? listAccountOptions(user) : Promise.resolve(null),
  ]);
  const filtered = Boolean(filter.status || filter.accountId || filter.q);
  const mayCreate = can(user.role, 'quote:manage');

  return (
    <PageBody>
      <PageHeader
        title="Quotes"
        description={
          staff
            ? 'Quotes for every customer account, newest first.'
            : 'Quotes your vendor has prepared for your account.'
        }
        actions={
          mayCreate && (
            <Link href="/quotes/new" className={buttonLinkClass}>
              New quote
            </Link>
          )
        }
      />
      <QuoteFilters filter={filter} accounts={accounts} />
      <p className="text-sm text-ink-muted tabular" aria-live="polite">
        {quotes.length} {quotes.length === 1 ? 'quote' : 'quotes'}
        {filtered ? ' match the filters' : ''}
        {quotes.length >= 300 ? ' (showing the newest 300; narrow the filters)' : ''}
      </p>
      <QuotesTable
        quotes={quotes}
        hideAccount={!staff}
        empty={
          <EmptyState title={filtered ? 'No quotes match these filters' : 'No quotes yet'}>
            {filtered ? (
              <Link href="/quotes" className="text-tide-600 underline">
                Clear the filters
              </Link>
            ) : mayCreate ? (
              'Start one from a customer account’s saved sizings.'
            ) : null}
          </EmptyState>
        }
      />
    </PageBody>
  );
}

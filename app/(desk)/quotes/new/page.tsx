import type { Metadata } from 'next';
import Link from 'next/link';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { firstParam, type SearchParams } from '@/app/_components/route-guards';
import { listAccountOptions } from '@/lib/accounts/queries';
import { requirePageUser } from '@/lib/auth/guards';
import { listSizings } from '@/lib/sizings/queries';
import { toSizingOption } from '../_components/sizing-option';
import { NewQuoteForm } from './_components/new-quote-form';

export const metadata: Metadata = { title: 'New quote' };

export default async function NewQuotePage({ searchParams }: { searchParams: SearchParams }) {
  const sp = await searchParams;
  const user = await requirePageUser('/quotes/new', 'quote:manage');
  const accounts = await listAccountOptions(user);
  // Only an id from the user's own picker list is honoured, so nothing unknown reaches the sizing query.
  const wanted = firstParam(sp.accountId);
  const accountId = accounts.some((a) => a.id === wanted) ? (wanted ?? null) : null;
  const sizings = accountId ? (await listSizings(user, { accountId, limit: 500 })).map(toSizingOption) : [];
  return (
    <PageBody>
      <PageHeader
        eyebrow={
          <Link href="/quotes" className="underline">
            Quotes
          </Link>
        }
        title="New quote"
        description="A draft quote for one customer account. Its lines are sizings saved to that account."
      />
      <Section title="Quote" id="quote">
        {accounts.length ? (
          <NewQuoteForm accounts={accounts} accountId={accountId} sizings={sizings} />
        ) : (
          <p className="text-sm text-ink-muted">
            There are no customer accounts yet.{' '}
            <Link href="/accounts/new" className="text-tide-600 underline">
              Create one
            </Link>{' '}
            first.
          </p>
        )}
      </Section>
    </PageBody>
  );
}

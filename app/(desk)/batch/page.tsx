import type { Metadata } from 'next';
import { listAccountOptions } from '@/lib/accounts/queries';
import { requirePageUser } from '@/lib/auth/guards';
import { can } from '@/lib/auth/roles';
import { listOpenQuotes } from '@/lib/quotes/queries';
import { BatchDesk } from './_components/batch-desk';

export const metadata: Metadata = { title: 'Batch sizing' };

export default async function BatchPage() {
  const user = await requirePageUser('/batch', 'batch:upload');
  const [accounts, quotes] = await Promise.all([
    listAccountOptions(user),
    can(user.role, 'quote:manage') ? listOpenQuotes(user) : Promise.resolve([]),
  ]);
  return (
    <main className="px-6 py-8">
      <h1 className="text-2xl font-semibold">Batch sizing</h1>
      <p className="mt-1 max-w-3xl text-ink-soft">
        Size a whole enquiry at once: one duty point a row, every quantity with its unit column. Nothing is saved until
        you confirm.{' '}
        <a className="text-tide-700 underline" href="/api/v1/batch/template">
          Download the template
        </a>
      </p>
      <BatchDesk
        accounts={accounts}
        quotes={quotes}
        canQuote={can(user.role, 'quote:manage')}
        fixedAccountId={user.role === 'customer' ? user.accountId : null}
        unitSystem={user.unitSystem}
      />
    </main>
  );
}

import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/app/_components/empty-state';
import { PageBody, PageHeader } from '@/app/_components/page-header';
import { requirePageUser } from '@/lib/auth/guards';
import { can, isStaff } from '@/lib/auth/roles';
import { downloadAccess, listDatasheets } from '@/lib/datasheets/queries';
import { DatasheetCard } from './_components/datasheet-card';

export const metadata: Metadata = { title: 'Datasheets' };

export default async function DatasheetsPage() {
  const user = await requirePageUser('/datasheets', 'datasheet:read');
  const [list, access] = await Promise.all([listDatasheets(user), downloadAccess(user)]);
  const staff = isStaff(user.role);
  return (
    <PageBody>
      <PageHeader
        title="Datasheets"
        description={
          staff
            ? 'Issued datasheets for every customer account, newest first. An issued revision never changes; re-issuing makes the next letter.'
            : 'Datasheets issued for your account. An issued revision never changes; a later change comes out as a new revision.'
        }
      />
      {!access.unlocked && (
        <p
          role="status"
          className="rounded-md border border-severity-caution/40 bg-paper-raised px-3 py-2 text-sm text-ink-soft"
        >
          {access.reason === 'no-account'
            ? 'Your sign-in is not linked to a customer account yet, so there is nothing to download.'
            : 'Your account has no active subscription, so datasheets are listed but locked. '}
          {access.reason !== 'no-account' && can(user.role, 'billing:manage') && (
            <Link href="/billing" className="font-medium text-tide-600 underline">
              Subscribe to download
            </Link>
          )}
        </p>
      )}
      {list.length === 0 ? (
        <EmptyState title="No datasheets yet">
          {can(user.role, 'datasheet:issue') ? 'Issue one from a saved sizing’s page.' : null}
        </EmptyState>
      ) : (
        <div className="space-y-4">
          {list.map((ds) => (
            <DatasheetCard key={ds.id} ds={ds} unlocked={access.unlocked} showAccount />
          ))}
        </div>
      )}
      {list.length >= 200 && <p className="text-sm text-ink-muted">Showing the newest 200 datasheets.</p>}
    </PageBody>
  );
}

import type { Metadata } from 'next';
import Link from 'next/link';
import { DataTable, tableLinkClass, type Column } from '@/app/_components/data-table';
import { EmptyState } from '@/app/_components/empty-state';
import { PageBody, PageHeader } from '@/app/_components/page-header';
import { SubscriptionBadge } from '@/app/_components/status-badge';
import { buttonLinkClass } from '@/app/_components/submit-button';
import { listAccounts, type AccountSummary } from '@/lib/accounts/queries';
import { requirePageUser } from '@/lib/auth/guards';
import { can, isStaff } from '@/lib/auth/roles';

export const metadata: Metadata = { title: 'Customer accounts' };

const columns: Column<AccountSummary>[] = [
  {
    key: 'name',
    header: 'Customer account',
    cell: (a) => (
      <Link href={`/accounts/${a.id}`} className={tableLinkClass}>
        {a.name}
      </Link>
    ),
  },
  { key: 'site', header: 'Site', cell: (a) => a.site ?? '—' },
  { key: 'members', header: 'Members', numeric: true, cell: (a) => a.memberCount },
  { key: 'quotes', header: 'Quotes', numeric: true, cell: (a) => a.quoteCount },
  { key: 'sizings', header: 'Sizings', numeric: true, cell: (a) => a.sizingCount },
  { key: 'subscription', header: 'Subscription', cell: (a) => <SubscriptionBadge state={a.subscription} /> },
];

export default async function AccountsPage() {
  const user = await requirePageUser('/accounts', 'account:read');
  const accounts = await listAccounts(user);
  const mayCreate = can(user.role, 'account:manage');
  return (
    <PageBody>
      <PageHeader
        title="Customer accounts"
        description={
          isStaff(user.role)
            ? 'Every customer account, with its members, quotes and subscription.'
            : 'Your company’s customer account.'
        }
        actions={
          mayCreate && (
            <Link href="/accounts/new" className={buttonLinkClass}>
              New customer account
            </Link>
          )
        }
      />
      <DataTable
        caption="Customer accounts"
        columns={columns}
        rows={accounts}
        rowKey={(a) => a.id}
        testId="accounts-table"
        empty={
          <EmptyState title="No customer accounts yet">
            {mayCreate
              ? 'Create one for a prospect to start saving sizings and quotes against it.'
              : 'Your sign-in is not linked to a customer account; ask your vendor contact for an invitation.'}
          </EmptyState>
        }
      />
    </PageBody>
  );
}

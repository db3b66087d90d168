import type { Metadata } from 'next';
import Link from 'next/link';
import { DataTable, tableLinkClass, type Column } from '@/app/_components/data-table';
import { EmptyState } from '@/app/_components/empty-state';
import { formatDate } from '@/app/_components/format';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { firstParam, type SearchParams } from '@/app/_components/route-guards';
import { StatusBadge } from '@/app/_components/status-badge';
import { requirePageUser } from '@/lib/auth/guards';
import { roleLabels } from '@/lib/auth/roles';
import { listUsers, type UserSummary } from '@/lib/users/queries';
import { peopleSearchSchema } from '@/lib/users/schema';
import { DisableButton } from './_components/disable-button';
import { InviteStaffForm } from './_components/invite-staff-form';
import { RoleForm } from './_components/role-form';

export const metadata: Metadata = { title: 'People and roles' };

export default async function AdminPage({ searchParams }: { searchParams: SearchParams }) {
  const me = await requirePageUser('/admin', 'users:manage');
  const { q } = peopleSearchSchema.parse({ q: firstParam((await searchParams).q) || undefined });
  const people = await listUsers(me, q);
  const columns: Column<UserSummary>[] = [
    {
      key: 'name',
      header: 'Name',
      cell: (u) => (
        <span className="font-medium">
          {u.name}
          {u.id === me.id && <span className="ml-1 text-ink-muted">(you)</span>}
        </span>
      ),
    },
    { key: 'email', header: 'E-mail', cell: (u) => <span className="font-mono">{u.email}</span> },
    {
      key: 'role',
      header: 'Role',
      // Customers are bound to their account, and nobody changes their own role, so those rows are read-only.
      cell: (u) =>
        u.role === 'customer' || u.id === me.id ? (
          roleLabels[u.role]
        ) : (
          <RoleForm userId={u.id} role={u.role} name={u.name} />
        ),
    },
    {
      key: 'account',
      header: 'Customer account',
      cell: (u) =>
        u.accountId ? (
          <Link href={`/accounts/${u.accountId}`} className={tableLinkClass}>
            {u.accountName}
          </Link>
        ) : (
          '—'
        ),
    },
    { key: 'since', header: 'Since', numeric: true, cell: (u) => formatDate(u.createdAt) },
    {
      key: 'state',
      header: 'Sign-in',
      cell: (u) =>
        u.disabledAt ? (
          <StatusBadge tone="danger">Disabled {formatDate(u.disabledAt)}</StatusBadge>
        ) : (
          <StatusBadge tone="good">Active</StatusBadge>
        ),
    },
    {
      key: 'actions',
      header: 'Change',
      cell: (u) =>
        u.id === me.id ? null : <DisableButton userId={u.id} disabled={u.disabledAt !== null} name={u.name} />,
    },
  ];
  return (
    <PageBody>
      <PageHeader
        title="People and roles"
        description={
          <>
            Staff roles decide what each person may do; every change is recorded in the{' '}
            <Link href="/support/audit?entityType=user" className="text-tide-600 underline">
              audit trail
            </Link>
            . Customer users join through sign-up or an invitation to their account.
          </>
        }
      />
      <Section title="Invite a staff member" id="invite-staff">
        <InviteStaffForm />
      </Section>
      <form method="get" action="/admin" role="search" aria-label="Search people" className="flex items-end gap-2">
        <label className="text-label">
          Search people
          <input
            type="search"
            name="q"
            defaultValue={q ?? ''}
            placeholder="Name, e-mail or company"
            className="mt-1 block w-72 rounded-md border border-paper-line bg-paper-raised px-3 py-2"
            data-testid="people-search"
          />
        </label>
        <button type="submit" className="rounded-md bg-tide-600 px-4 py-2 text-sm font-medium text-white">
          Search
        </button>
        {q && (
          <Link href="/admin" className="px-2 py-2 text-sm text-tide-600 underline">
            Show everyone
          </Link>
        )}
      </form>
      <DataTable
        caption="People"
        columns={columns}
        rows={people}
        rowKey={(u) => u.id}
        testId="people-table"
        empty={<EmptyState title={q ? `Nobody matches “${q}”` : 'No users yet'} />}
      />
    </PageBody>
  );
}

import type { Metadata } from 'next';
import { DataTable, type Column } from '@/app/_components/data-table';
import { EmptyState } from '@/app/_components/empty-state';
import { formatDate, formatDateTime } from '@/app/_components/format';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { StatusBadge } from '@/app/_components/status-badge';
import { listApiKeys, type ApiKeyRow } from '@/lib/api-keys/queries';
import { requirePageUser } from '@/lib/auth/guards';
import { isStaff } from '@/lib/auth/roles';
import { CreateKeyForm } from './_components/create-key-form';
import { RevokeKeyButton } from './_components/revoke-key-button';

export const metadata: Metadata = { title: 'API keys' };

const columns: Column<ApiKeyRow>[] = [
  {
    key: 'name',
    header: 'Name',
    cell: (k) => (
      <span>
        <span className="font-medium">{k.name}</span>
        <span className="block font-mono text-hint text-ink-muted">{k.prefix}_…</span>
      </span>
    ),
  },
  { key: 'limit', header: 'Limit a minute', numeric: true, cell: (k) => k.perMinute.toLocaleString('en-GB') },
  { key: 'today', header: 'Requests today (UTC)', numeric: true, cell: (k) => k.usedToday.toLocaleString('en-GB') },
  { key: 'used', header: 'Last used', cell: (k) => (k.lastUsedAt ? formatDateTime(k.lastUsedAt) : 'Never') },
  { key: 'created', header: 'Created', cell: (k) => `${formatDate(k.createdAt)} by ${k.createdBy}` },
  {
    key: 'state',
    header: 'State',
    cell: (k) =>
      k.revokedAt ? (
        <StatusBadge tone="danger">Revoked {formatDate(k.revokedAt)}</StatusBadge>
      ) : (
        <RevokeKeyButton keyId={k.id} name={k.name} />
      ),
  },
];

/** The keys machine clients use for the public API: create (shown once), see their use, revoke. */
export default async function ApiKeysPage() {
  const user = await requirePageUser('/api-keys', 'apikey:manage');
  const keys = await listApiKeys(user);
  const whose = isStaff(user.role) ? 'your own' : 'your account’s';
  return (
    <PageBody>
      <PageHeader
        title="API keys"
        description={
          <>
            Tools and scripts size duties through <code className="font-mono">POST /api/v1/calculate</code> with {whose}{' '}
            keys. Each key has its own limit and daily count, and every request made with it is recorded in the audit
            trail under {isStaff(user.role) ? 'your name' : 'your account'}. Sizings through the API are preliminary,
            like every Dutywise sizing.
          </>
        }
      />
      <Section title="New key" id="new-key">
        <CreateKeyForm />
      </Section>
      <DataTable
        caption="API keys"
        columns={columns}
        rows={keys}
        rowKey={(k) => k.id}
        testId="api-keys-table"
        empty={
          <EmptyState title="No API keys yet">Create one above for each tool that sizes through the API.</EmptyState>
        }
      />
    </PageBody>
  );
}

import Link from 'next/link';
import { DataTable, tableLinkClass, type Column } from './data-table';
import { EmptyState } from './empty-state';
import { formatDateTime } from './format';
import { actionWords, detailWords } from './audit-words';
import type { AuditRow } from '@/lib/audit/queries';
import { roleLabels, type UserRole } from '@/lib/auth/roles';

// Only entities that have a page today get a link; the rest show their id.
const entityPages: Record<string, (id: string) => string> = {
  account: (id) => `/accounts/${id}`,
  quote: (id) => `/quotes/${id}`,
  sizing: (id) => `/sizings/${id}`,
};

function roleText(role: string | null): string {
  return role && role in roleLabels ? roleLabels[role as UserRole] : (role ?? '');
}

const columns: Column<AuditRow>[] = [
  { key: 'at', header: 'When', numeric: true, className: 'whitespace-nowrap', cell: (r) => formatDateTime(r.at) },
  {
    key: 'actor',
    header: 'Who',
    cell: (r) =>
      r.actorUserId ? (
        <span>
          {r.actorName ?? r.actorEmail ?? 'deleted user'}
          <span className="block text-hint text-ink-muted">{roleText(r.actorRole)}</span>
        </span>
      ) : (
        <span className="text-ink-muted">system</span>
      ),
  },
  { key: 'action', header: 'What happened', cell: (r) => actionWords(r.action) },
  {
    key: 'entity',
    header: 'Record',
    cell: (r) => {
      const page = entityPages[r.entityType];
      const name = r.recordName ?? `${r.entityType.replace(/_/g, ' ')} (no longer exists)`;
      return (
        <span>
          {page && r.recordName ? (
            <Link href={page(r.entityId)} className={tableLinkClass}>
              {name}
            </Link>
          ) : (
            name
          )}{' '}
          <Link
            href={`/support/audit?entityType=${encodeURIComponent(r.entityType)}&entityId=${encodeURIComponent(r.entityId)}`}
            className="text-hint text-tide-600 underline"
          >
            history
          </Link>
        </span>
      );
    },
  },
  {
    key: 'account',
    header: 'Customer account',
    cell: (r) =>
      r.accountId ? (
        <Link href={`/accounts/${r.accountId}`} className={tableLinkClass}>
          {r.accountName ?? r.accountId}
        </Link>
      ) : (
        '—'
      ),
  },
  {
    key: 'detail',
    header: 'What changed',
    cell: (r) => <span className="text-hint text-ink-soft">{detailWords(r.action, r.detail)}</span>,
  },
];

/** The audit trail, newest first. */
export function AuditTable({ rows, filtered }: { rows: AuditRow[]; filtered: boolean }) {
  return (
    <DataTable
      caption="Audit trail"
      columns={columns}
      rows={rows}
      rowKey={(r) => String(r.id)}
      testId="audit-table"
      empty={<EmptyState title={filtered ? 'No audit entries for this filter' : 'No audit entries yet'} />}
    />
  );
}

import type { Metadata } from 'next';
import { AuditFilters } from '@/app/_components/audit-filters';
import { AuditTable } from '@/app/_components/audit-table';
import { PageBody, PageHeader } from '@/app/_components/page-header';
import { firstParam, type SearchParams } from '@/app/_components/route-guards';
import { AUDIT_PAGE_SIZE, auditFilterSchema, listAuditEntries } from '@/lib/audit/queries';
import { requirePageUser } from '@/lib/auth/guards';

export const metadata: Metadata = { title: 'Audit trail' };

export default async function AuditPage({ searchParams }: { searchParams: SearchParams }) {
  const sp = await searchParams;
  const user = await requirePageUser('/support/audit', 'audit:read');
  const filter = auditFilterSchema.parse({
    entityType: firstParam(sp.entityType) || undefined,
    entityId: firstParam(sp.entityId) || undefined,
  });
  const rows = await listAuditEntries(user, filter);
  const filtered = Boolean(filter.entityType || filter.entityId);
  return (
    <PageBody>
      <PageHeader
        title="Audit trail"
        description={`Who created, changed, sent, issued or looked up what, and when. The newest ${AUDIT_PAGE_SIZE} entries${filtered ? ' matching the filter' : ''}.`}
      />
      <AuditFilters filter={filter} />
      <AuditTable rows={rows} filtered={filtered} />
    </PageBody>
  );
}

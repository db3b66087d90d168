import 'server-only';
import type { Db, Tx } from '@/db';
import { auditLog } from '@/db/schema';

export type AuditInput = {
  actor: { id: string; role: string } | null;
  action: string;
  entityType: string;
  entityId: string;
  accountId?: string | null;
  detail?: Record<string, unknown>;
};

/**
 * Records an audit entry inside the caller's transaction, so the change and its record commit together; a
 * look-up that changes nothing passes the pool itself.
 */
export async function writeAudit(tx: Tx | Db, entry: AuditInput): Promise<void> {
  await tx.insert(auditLog).values({
    actorUserId: entry.actor?.id ?? null,
    actorRole: entry.actor?.role ?? null,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    accountId: entry.accountId ?? null,
    detail: entry.detail ?? null,
  });
}

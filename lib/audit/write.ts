import 'server-only';
import { db, type Tx } from '@/db';
import { groupWhileBusy } from '@/db/grouped';
import { auditLog } from '@/db/schema';

export type AuditInput = {
  actor: { id: string; role: string } | null;
  action: string;
  entityType: string;
  entityId: string;
  accountId?: string | null;
  detail?: Record<string, unknown>;
};

const row = (entry: AuditInput) => ({
  actorUserId: entry.actor?.id ?? null,
  actorRole: entry.actor?.role ?? null,
  action: entry.action,
  entityType: entry.entityType,
  entityId: entry.entityId,
  accountId: entry.accountId ?? null,
  detail: entry.detail ?? null,
});

/** Records an audit entry inside the caller's transaction, so the change and its record commit together. */
export async function writeAudit(tx: Tx, entry: AuditInput): Promise<void> {
  await tx.insert(auditLog).values(row(entry));
}

const insertGrouped = groupWhileBusy(async (entries: AuditInput[]) => {
  await db.insert(auditLog).values(entries.map(row));
  return entries.map(() => undefined);
});

/**
 * Records an audit entry of something that changed nothing (a look-up, a record opened), on its own: entries
 * made while another is being written go together in one insert (db/grouped.ts). Resolves once it is stored.
 */
export function recordAudit(entry: AuditInput): Promise<void> {
  return insertGrouped(entry);
}

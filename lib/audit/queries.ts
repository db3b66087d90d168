import 'server-only';
import { and, desc, eq, sql, type SQL } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db';
import { accounts, auditLog, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can } from '@/lib/auth/roles';
import { AppError } from '@/lib/errors';
import { entityIdsForNumber, recordNameSql } from './record-names';

/** Filters as they arrive in the URL; anything malformed is dropped rather than refused. */
export const auditFilterSchema = z.object({
  entityType: z
    .string()
    .trim()
    .regex(/^[a-z][a-z_]{0,39}$/)
    .optional()
    .catch(undefined),
  // A record's id, or its number as people write it (S26-01001, Q26-0101, DS26-501).
  entityId: z.string().trim().min(1).max(100).optional().catch(undefined),
});

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export type AuditFilter = z.output<typeof auditFilterSchema>;

export type AuditRow = {
  id: number;
  at: Date;
  actorUserId: string | null;
  actorName: string | null;
  actorEmail: string | null;
  actorRole: string | null;
  action: string;
  entityType: string;
  entityId: string;
  /** The record's number and name, when it still exists. */
  recordName: string | null;
  accountId: string | null;
  accountName: string | null;
  detail: unknown;
};

export const AUDIT_PAGE_SIZE = 200;

/** The newest audit entries, optionally for one entity type or one entity (admins and support). */
export async function listAuditEntries(actor: CurrentUser, filter: AuditFilter = {}): Promise<AuditRow[]> {
  if (!can(actor.role, 'audit:read')) throw new AppError('forbidden', 'Your role does not allow this.');
  const conds: SQL[] = [];
  if (filter.entityType) conds.push(eq(auditLog.entityType, filter.entityType));
  if (filter.entityId)
    conds.push(
      UUID.test(filter.entityId)
        ? eq(auditLog.entityId, filter.entityId)
        : sql`(${eq(auditLog.entityId, filter.entityId)} or ${entityIdsForNumber(filter.entityId)})`,
    );
  return db
    .select({
      id: auditLog.id,
      at: auditLog.at,
      actorUserId: auditLog.actorUserId,
      actorName: users.name,
      actorEmail: users.email,
      actorRole: auditLog.actorRole,
      action: auditLog.action,
      entityType: auditLog.entityType,
      entityId: auditLog.entityId,
      recordName: recordNameSql,
      accountId: auditLog.accountId,
      accountName: accounts.name,
      detail: auditLog.detail,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorUserId))
    .leftJoin(accounts, eq(accounts.id, auditLog.accountId))
    .where(conds.length ? and(...conds) : undefined)
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(AUDIT_PAGE_SIZE);
}

import 'server-only';
import { and, desc, eq, inArray, or } from 'drizzle-orm';
import { db } from '@/db';
import { auditLog, datasheetRevisions, datasheets, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can } from '@/lib/auth/roles';
import { listEmailsForAny, type EmailLogEntry } from '@/lib/email/queries';

export type TrailEntry = {
  id: number;
  at: Date;
  action: string;
  actorName: string | null;
  actorRole: string | null;
  detail: unknown;
};

/** A sizing's audit trail, including its datasheet's entries (support and admin only). */
export async function sizingTrail(user: CurrentUser, sizingId: string): Promise<TrailEntry[] | null> {
  if (!can(user.role, 'audit:read')) return null;
  const [ds] = await db
    .select({ id: datasheets.id })
    .from(datasheets)
    .where(eq(datasheets.sizingId, sizingId))
    .limit(1);
  const revisionIds = ds
    ? (
        await db
          .select({ id: datasheetRevisions.id })
          .from(datasheetRevisions)
          .where(eq(datasheetRevisions.datasheetId, ds.id))
      ).map((r) => r.id)
    : [];
  const ofSizing = and(eq(auditLog.entityType, 'sizing'), eq(auditLog.entityId, sizingId));
  // Issues and downloads are recorded against the datasheet or its revisions.
  const match = ds
    ? or(
        ofSizing,
        and(eq(auditLog.entityType, 'datasheet'), eq(auditLog.entityId, ds.id)),
        revisionIds.length
          ? and(eq(auditLog.entityType, 'datasheet_revision'), inArray(auditLog.entityId, revisionIds))
          : undefined,
      )
    : ofSizing;
  return db
    .select({
      id: auditLog.id,
      at: auditLog.at,
      action: auditLog.action,
      actorName: users.name,
      actorRole: auditLog.actorRole,
      detail: auditLog.detail,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorUserId))
    .where(match)
    .orderBy(desc(auditLog.at))
    .limit(200);
}

/**
 * E-mails sent about the sizing's datasheet (support and admin only): the issue notices, recorded against each
 * revision, and any older copies recorded against the datasheet itself.
 */
export async function sizingEmails(user: CurrentUser, sizingId: string): Promise<EmailLogEntry[] | null> {
  if (!can(user.role, 'audit:read')) return null;
  const [ds] = await db
    .select({ id: datasheets.id })
    .from(datasheets)
    .where(eq(datasheets.sizingId, sizingId))
    .limit(1);
  if (!ds) return [];
  const revs = await db
    .select({ id: datasheetRevisions.id })
    .from(datasheetRevisions)
    .where(eq(datasheetRevisions.datasheetId, ds.id));
  return listEmailsForAny([
    { type: 'datasheet', ids: [ds.id] },
    { type: 'datasheet_revision', ids: revs.map((r) => r.id) },
  ]);
}

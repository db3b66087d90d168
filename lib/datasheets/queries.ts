import 'server-only';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, datasheetRevisions, datasheets, sizings, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountScope } from '@/lib/auth/guards';
import { can, isStaff } from '@/lib/auth/roles';
import { getEntitlement } from '@/lib/billing/entitlements';
import { AppError } from '@/lib/errors';
import { compareRevisionLetters } from './revision-letter';

export type RevisionSummary = {
  id: string;
  revision: string;
  issuedAt: Date;
  sha256: string;
  byteSize: number;
  note: string | null;
  issuedByName: string | null;
};

export type DatasheetSummary = {
  id: string;
  number: string;
  accountId: string;
  accountName: string;
  sizingId: string;
  sizingTitle: string;
  equipmentTag: string | null;
  service: 'heater' | 'compressor';
  createdAt: Date;
  /** In issue order, A first. */
  revisions: RevisionSummary[];
};

function requireRead(user: CurrentUser): void {
  if (!can(user.role, 'datasheet:read'))
    throw new AppError('forbidden', 'Your role does not allow reading datasheets.');
}

/** Datasheets the user may see (staff: every account; customers: their own), newest first, with their revisions. */
export async function listDatasheets(
  user: CurrentUser,
  filter: { sizingId?: string; limit?: number } = {},
): Promise<DatasheetSummary[]> {
  requireRead(user);
  const scope = accountScope(user);
  const conds = [
    scope ? eq(datasheets.accountId, scope) : undefined,
    filter.sizingId ? eq(datasheets.sizingId, filter.sizingId) : undefined,
  ].filter((c) => c !== undefined);
  const rows = await db
    .select({
      id: datasheets.id,
      number: datasheets.number,
      accountId: datasheets.accountId,
      accountName: accounts.name,
      sizingId: datasheets.sizingId,
      sizingTitle: sizings.title,
      equipmentTag: sizings.equipmentTag,
      service: sizings.service,
      createdAt: datasheets.createdAt,
    })
    .from(datasheets)
    .innerJoin(sizings, eq(sizings.id, datasheets.sizingId))
    .innerJoin(accounts, eq(accounts.id, datasheets.accountId))
    .where(conds.length ? and(...conds) : undefined)
    .orderBy(desc(datasheets.createdAt))
    .limit(Math.min(filter.limit ?? 200, 500));
  if (rows.length === 0) return [];
  const revs = await db
    .select({
      datasheetId: datasheetRevisions.datasheetId,
      id: datasheetRevisions.id,
      revision: datasheetRevisions.revision,
      issuedAt: datasheetRevisions.issuedAt,
      sha256: datasheetRevisions.sha256,
      byteSize: datasheetRevisions.byteSize,
      note: datasheetRevisions.note,
      issuedByName: users.name,
    })
    .from(datasheetRevisions)
    .leftJoin(users, eq(users.id, datasheetRevisions.issuedByUserId))
    .where(
      inArray(
        datasheetRevisions.datasheetId,
        rows.map((r) => r.id),
      ),
    );
  const byDatasheet = new Map<string, RevisionSummary[]>();
  for (const { datasheetId, ...r } of revs)
    (byDatasheet.get(datasheetId) ?? byDatasheet.set(datasheetId, []).get(datasheetId)!).push(r);
  return rows.map((r) => ({
    ...r,
    revisions: (byDatasheet.get(r.id) ?? []).sort((a, b) => compareRevisionLetters(a.revision, b.revision)),
  }));
}

export type DownloadAccess = { unlocked: boolean; reason: 'staff' | 'subscribed' | 'no-subscription' | 'no-account' };

/** Whether the user may download their datasheets: staff always, customers while their account's subscription entitles them. */
export async function downloadAccess(user: CurrentUser): Promise<DownloadAccess> {
  if (isStaff(user.role)) return { unlocked: true, reason: 'staff' };
  if (!user.accountId) return { unlocked: false, reason: 'no-account' };
  const ent = await getEntitlement(user.accountId);
  return ent.unlocked ? { unlocked: true, reason: 'subscribed' } : { unlocked: false, reason: 'no-subscription' };
}

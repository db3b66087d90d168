import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, datasheetRevisions, datasheets, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { nextNumber } from '@/lib/numbering/next-number';
import type { SizingResult } from '@/lib/engine';
import { AppError } from '@/lib/errors';
import type { SizingDetail } from '@/lib/sizings/queries';
import { compareRevisionLetters, nextRevisionLetter } from './revision-letter';
import type { DatasheetSnapshot, RevisionEntry } from './snapshot';

export type IssueAccount = {
  id: string;
  name: string;
  site: string | null;
  billingContactEmail: string | null;
  unitSystem: 'si' | 'us';
};

/** What one attempt intends to write; the commit re-checks `previous` under the row lock. */
export type IssuePlan = {
  datasheetId: string | null;
  number: string;
  revision: string;
  previous: string | null;
  issuedAt: Date;
  note: string | null;
  account: IssueAccount;
  sizing: SizingDetail;
  user: CurrentUser;
  snapshot: DatasheetSnapshot;
};

/** A saved result the datasheet can print; rows saved without engine output are refused with a reason. */
export function engineResultOf(sizing: SizingDetail): SizingResult {
  const r = sizing.result as Partial<SizingResult> | null;
  const ok =
    r &&
    ((r.service === 'heater' && 'heater' in r) || (r.service === 'compressor' && 'compressor' in r)) &&
    Array.isArray(r.warnings) &&
    r.gas &&
    r.basis;
  if (!ok)
    throw new AppError(
      'unprocessable',
      `Sizing ${sizing.number} has no complete engine result stored; re-save it from the sizing form before issuing a datasheet.`,
    );
  return r as SizingResult;
}

export async function loadIssueAccount(accountId: string): Promise<IssueAccount> {
  const [a] = await db
    .select({
      id: accounts.id,
      name: accounts.name,
      site: accounts.site,
      billingContactEmail: accounts.billingContactEmail,
      unitSystem: accounts.unitSystem,
    })
    .from(accounts)
    .where(eq(accounts.id, accountId))
    .limit(1);
  if (!a) throw new AppError('not_found', 'That customer account no longer exists.');
  return a;
}

async function history(datasheetId: string): Promise<RevisionEntry[]> {
  const rows = await db
    .select({
      revision: datasheetRevisions.revision,
      issuedAt: datasheetRevisions.issuedAt,
      note: datasheetRevisions.note,
      issuedByName: users.name,
      sizingVersion: sql<number | null>`(${datasheetRevisions.snapshot} -> 'sizing' ->> 'revision')::int`,
    })
    .from(datasheetRevisions)
    .leftJoin(users, eq(users.id, datasheetRevisions.issuedByUserId))
    .where(eq(datasheetRevisions.datasheetId, datasheetId));
  return rows
    .map((r) => ({
      revision: r.revision,
      issuedAt: r.issuedAt.toISOString(),
      note: r.note,
      issuedByName: r.issuedByName,
      ...(r.sizingVersion ? { sizingVersion: r.sizingVersion } : {}),
    }))
    .sort((a, b) => compareRevisionLetters(a.revision, b.revision));
}

/**
 * Reads the datasheet's current state and decides the next letter (and, for a first issue, reserves a
 * number: sequence values are never rolled back, so an abandoned attempt only leaves a gap).
 */
export async function planIssue(
  user: CurrentUser,
  sizing: SizingDetail,
  account: IssueAccount,
  note: string | null,
): Promise<IssuePlan> {
  const result = engineResultOf(sizing);
  const [existing] = await db
    .select({ id: datasheets.id, number: datasheets.number })
    .from(datasheets)
    .where(eq(datasheets.sizingId, sizing.id))
    .limit(1);
  const past = existing ? await history(existing.id) : [];
  const previous = past.at(-1)?.revision ?? null;
  const revision = nextRevisionLetter(previous);
  if (!revision)
    throw new AppError(
      'conflict',
      `Datasheet ${existing?.number ?? ''} has used every revision letter up to ZZ; issue a new datasheet from a new sizing.`,
    );
  const number = existing?.number ?? (await db.transaction((tx) => nextNumber(tx, 'datasheet')));
  const issuedAt = new Date();
  const entry: RevisionEntry = {
    revision,
    issuedAt: issuedAt.toISOString(),
    note,
    issuedByName: user.name,
    sizingVersion: sizing.revision,
  };
  const snapshot: DatasheetSnapshot = {
    schemaVersion: 1,
    datasheet: { number, revision, issuedAt: entry.issuedAt, note, issuedByName: user.name },
    account: { id: account.id, name: account.name, site: account.site },
    units: account.unitSystem,
    sizing: {
      id: sizing.id,
      number: sizing.number,
      title: sizing.title,
      equipmentTag: sizing.equipmentTag,
      service: sizing.service,
      gasLabel: sizing.gasLabel,
      notes: sizing.notes,
      engineVersion: sizing.engineVersion,
      revision: sizing.revision,
      createdAt: sizing.createdAt.toISOString(),
    },
    input: sizing.input,
    result,
    revisions: [...past, entry],
  };
  return {
    datasheetId: existing?.id ?? null,
    number,
    revision,
    previous,
    issuedAt,
    note,
    account,
    sizing,
    user,
    snapshot,
  };
}

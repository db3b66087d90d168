import 'server-only';
import { and, desc, eq, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { db } from '@/db';
import { accounts, sizings, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountScope, assertAccountAccess } from '@/lib/auth/guards';
import { AppError } from '@/lib/errors';

export type SizingSummary = {
  id: string;
  number: string;
  title: string;
  equipmentTag: string | null;
  service: 'heater' | 'compressor';
  gasLabel: string;
  headlineKw: number;
  accountId: string;
  accountName: string;
  createdAt: Date;
};

const summaryColumns = {
  id: sizings.id,
  number: sizings.number,
  title: sizings.title,
  equipmentTag: sizings.equipmentTag,
  service: sizings.service,
  gasLabel: sizings.gasLabel,
  headlineKw: sizings.headlineKw,
  accountId: sizings.accountId,
  accountName: accounts.name,
  createdAt: sizings.createdAt,
};

export async function listSizings(
  user: CurrentUser,
  filter: { accountId?: string; limit?: number } = {},
): Promise<SizingSummary[]> {
  const scope = accountScope(user);
  const conds: SQL[] = [];
  if (scope) conds.push(eq(sizings.accountId, scope));
  if (filter.accountId) conds.push(eq(sizings.accountId, filter.accountId));
  return db
    .select(summaryColumns)
    .from(sizings)
    .innerJoin(accounts, eq(accounts.id, sizings.accountId))
    .where(conds.length ? and(...conds) : undefined)
    .orderBy(desc(sizings.createdAt))
    .limit(Math.min(filter.limit ?? 200, 500));
}

export type SizingDetail = SizingSummary & {
  notes: string | null;
  input: unknown;
  result: unknown;
  engineVersion: string;
  /** The current version; earlier ones are in sizing_versions. */
  revision: number;
  /** When the current version was saved. */
  updatedAt: Date;
  createdByName: string | null;
  updatedByName: string | null;
  massFlowKgPerS: number;
  billingContactEmail: string | null;
};

const updater = alias(users, 'updater');

export async function getSizing(user: CurrentUser, sizingId: string): Promise<SizingDetail> {
  const [row] = await db
    .select({
      ...summaryColumns,
      notes: sizings.notes,
      input: sizings.input,
      result: sizings.result,
      engineVersion: sizings.engineVersion,
      revision: sizings.revision,
      updatedAt: sizings.updatedAt,
      createdByName: users.name,
      updatedByName: updater.name,
      massFlowKgPerS: sizings.massFlowKgPerS,
      billingContactEmail: accounts.billingContactEmail,
    })
    .from(sizings)
    .innerJoin(accounts, eq(accounts.id, sizings.accountId))
    .leftJoin(users, eq(users.id, sizings.createdByUserId))
    .leftJoin(updater, eq(updater.id, sizings.updatedByUserId))
    .where(eq(sizings.id, sizingId))
    .limit(1);
  if (!row) throw new AppError('not_found', 'Not found');
  assertAccountAccess(user, row.accountId);
  return row;
}

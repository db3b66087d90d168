import 'server-only';
import { desc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { sizingVersions, users } from '@/db/schema';
import type { SizingDetail } from './queries';

/** One version of a sizing record: the current one or an earlier one kept when it was revised. */
export type SizingVersionView = {
  version: number;
  current: boolean;
  title: string;
  equipmentTag: string | null;
  gasLabel: string;
  input: unknown;
  result: unknown;
  headlineKw: number;
  massFlowKgPerS: number;
  savedAt: Date;
  savedByName: string | null;
};

/**
 * Every version of a sizing, newest first. The caller has already read the sizing through getSizing, which
 * checked the user's access to its account.
 */
export async function listSizingVersions(sizing: SizingDetail): Promise<SizingVersionView[]> {
  const earlier = await db
    .select({
      version: sizingVersions.version,
      title: sizingVersions.title,
      equipmentTag: sizingVersions.equipmentTag,
      gasLabel: sizingVersions.gasLabel,
      input: sizingVersions.input,
      result: sizingVersions.result,
      headlineKw: sizingVersions.headlineKw,
      massFlowKgPerS: sizingVersions.massFlowKgPerS,
      savedAt: sizingVersions.savedAt,
      savedByName: users.name,
    })
    .from(sizingVersions)
    .leftJoin(users, eq(users.id, sizingVersions.createdByUserId))
    .where(eq(sizingVersions.sizingId, sizing.id))
    .orderBy(desc(sizingVersions.version));
  const current: SizingVersionView = {
    version: sizing.revision,
    current: true,
    title: sizing.title,
    equipmentTag: sizing.equipmentTag,
    gasLabel: sizing.gasLabel,
    input: sizing.input,
    result: sizing.result,
    headlineKw: sizing.headlineKw,
    massFlowKgPerS: sizing.massFlowKgPerS,
    savedAt: sizing.updatedAt,
    savedByName: sizing.updatedByName ?? sizing.createdByName,
  };
  return [current, ...earlier.map((v) => ({ ...v, current: false }))];
}

import 'server-only';
import { eq } from 'drizzle-orm';
import type { Tx } from '@/db';
import { sizings, sizingVersions } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { computedColumns, type Computed } from './columns';
import type { SizingMeta } from './schema';

/**
 * Saves a new version of an existing sizing: the current version is copied to sizing_versions and the record
 * (same id, same number, so the same datasheet) takes the new input, result and metadata. The row is locked so
 * two revisions saved at once get consecutive versions.
 */
export async function reviseSizing(
  tx: Tx,
  user: CurrentUser,
  meta: SizingMeta & { revisedFromId: string },
  computed: Computed,
): Promise<{ id: string; number: string; version: number }> {
  const [cur] = await tx.select().from(sizings).where(eq(sizings.id, meta.revisedFromId)).for('update').limit(1);
  if (!cur || cur.accountId !== meta.accountId)
    throw new AppError(
      'unprocessable',
      'The sizing being revised belongs to another account; save it as a new sizing.',
      [{ path: 'accountId', message: 'A revision stays with the account of the sizing it revises.' }],
    );
  if (cur.service !== computed.result.service)
    throw new AppError(
      'unprocessable',
      `Sizing ${cur.number} is a ${cur.service} sizing; a revision keeps the service. Save a ${computed.result.service} as a new sizing.`,
    );
  await tx.insert(sizingVersions).values({
    sizingId: cur.id,
    version: cur.revision,
    title: cur.title,
    equipmentTag: cur.equipmentTag,
    notes: cur.notes,
    gasLabel: cur.gasLabel,
    input: cur.input,
    result: cur.result,
    engineVersion: cur.engineVersion,
    headlineKw: cur.headlineKw,
    massFlowKgPerS: cur.massFlowKgPerS,
    createdByUserId: cur.updatedByUserId ?? cur.createdByUserId,
    savedAt: cur.updatedAt,
  });
  const version = cur.revision + 1;
  await tx
    .update(sizings)
    .set({
      title: meta.title,
      equipmentTag: meta.equipmentTag ?? null,
      notes: meta.notes ?? null,
      ...computedColumns(computed),
      revision: version,
      updatedByUserId: user.id,
      updatedAt: new Date(),
    })
    .where(eq(sizings.id, cur.id));
  await writeAudit(tx, {
    actor: user,
    action: 'sizing.revised',
    entityType: 'sizing',
    entityId: cur.id,
    accountId: cur.accountId,
    detail: { number: cur.number, version, quoteId: meta.quoteId ?? null },
  });
  return { id: cur.id, number: cur.number, version };
}

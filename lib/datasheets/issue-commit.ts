import 'server-only';
import { randomUUID } from 'node:crypto';
import { desc, eq, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { datasheetRevisions, datasheets } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import { accountKey, sha256Hex, type BlobStore } from '@/lib/blob';
import { enqueueEmail } from '@/lib/email/enqueue';
import { logger } from '@/lib/log/logger';
import type { IssuePlan } from './issue-plan';

export const PDF_CONTENT_TYPE = 'application/pdf';

export type IssuedRevision = {
  datasheetId: string;
  revisionId: string;
  number: string;
  revision: string;
  sha256: string;
  byteSize: number;
  blobKey: string;
  issuedAt: string;
};

/** Test seam: runs inside the transaction after every write and before commit (fault injection, crash tests). */
export type BeforeCommit = (tx: Tx, written: IssuedRevision) => Promise<void>;

/** Thrown inside the transaction when another issue got there first; the caller plans again. */
class StalePlan extends Error {}

function isRevisionConflict(err: unknown): boolean {
  const e =
    (err as { cause?: { code?: string; constraint?: string } } | null)?.cause ??
    (err as { code?: string; constraint?: string } | null);
  return e?.code === '23505' && e.constraint === 'datasheet_revisions_uq';
}

// The datasheet row, locked FOR UPDATE so concurrent issues of one sizing queue here, or created now.
async function lockDatasheet(tx: Tx, plan: IssuePlan): Promise<string> {
  if (plan.datasheetId) {
    const [row] = await tx
      .select({ id: datasheets.id })
      .from(datasheets)
      .where(eq(datasheets.id, plan.datasheetId))
      .for('update');
    if (!row) throw new StalePlan();
    return row.id;
  }
  const [created] = await tx
    .insert(datasheets)
    .values({ number: plan.number, accountId: plan.account.id, sizingId: plan.sizing.id })
    .onConflictDoNothing({ target: datasheets.sizingId })
    .returning({ id: datasheets.id });
  if (!created) throw new StalePlan();
  return created.id;
}

async function latestLetter(tx: Tx, datasheetId: string): Promise<string | null> {
  const [row] = await tx
    .select({ revision: datasheetRevisions.revision })
    .from(datasheetRevisions)
    .where(eq(datasheetRevisions.datasheetId, datasheetId))
    .orderBy(desc(sql`length(${datasheetRevisions.revision})`), desc(datasheetRevisions.revision))
    .limit(1);
  return row?.revision ?? null;
}

async function removeQuietly(store: BlobStore, key: string): Promise<void> {
  // If this fails too, sweepOrphanBlobs removes the object later; the issue itself already failed cleanly.
  await store
    .delete(key)
    .catch((err: unknown) => logger.error({ err, key }, 'could not delete the blob of a failed datasheet issue'));
}

/**
 * Writes one revision all or nothing. A transactional store writes the bytes inside the transaction; any
 * other store uploads first under a unique key and has the object deleted when the transaction fails.
 * Returns null when the plan went stale (another revision was issued meanwhile): nothing is left behind.
 */
export async function commitIssue(
  plan: IssuePlan,
  bytes: Buffer,
  store: BlobStore,
  beforeCommit?: BeforeCommit,
): Promise<IssuedRevision | null> {
  const blobKey = accountKey(plan.account.id, 'datasheets', plan.number, `${plan.revision}-${randomUUID()}.pdf`);
  const sha256 = sha256Hex(bytes);
  if (!store.transactional) await store.put(blobKey, bytes, PDF_CONTENT_TYPE);
  try {
    return await db.transaction(async (tx) => {
      const datasheetId = await lockDatasheet(tx, plan);
      if ((await latestLetter(tx, datasheetId)) !== plan.previous) throw new StalePlan();
      if (store.transactional) await store.put(blobKey, bytes, PDF_CONTENT_TYPE, tx);
      const [rev] = await tx
        .insert(datasheetRevisions)
        .values({
          datasheetId,
          revision: plan.revision,
          snapshot: plan.snapshot,
          blobKey,
          sha256,
          byteSize: bytes.byteLength,
          note: plan.note,
          issuedByUserId: plan.user.id,
          issuedAt: plan.issuedAt,
        })
        .returning({ id: datasheetRevisions.id });
      if (!rev) throw new Error('datasheet revision insert returned no row');
      const written: IssuedRevision = {
        datasheetId,
        revisionId: rev.id,
        number: plan.number,
        revision: plan.revision,
        sha256,
        byteSize: bytes.byteLength,
        blobKey,
        issuedAt: plan.issuedAt.toISOString(),
      };
      await writeAudit(tx, {
        actor: plan.user,
        action: 'datasheet.issued',
        entityType: 'datasheet_revision',
        entityId: rev.id,
        accountId: plan.account.id,
        detail: {
          number: plan.number,
          revision: plan.revision,
          sizingId: plan.sizing.id,
          sha256,
          byteSize: bytes.byteLength,
          store: store.kind,
        },
      });
      if (plan.account.billingContactEmail) {
        await enqueueEmail(tx, {
          template: 'datasheet-issued',
          to: plan.account.billingContactEmail,
          props: {
            accountName: plan.account.name,
            datasheetNumber: plan.number,
            revision: plan.revision,
            sizingTitle: plan.sizing.title,
            equipmentTag: plan.sizing.equipmentTag,
            datasheetUrl: `/datasheets#${plan.number}`,
          },
          accountId: plan.account.id,
          entity: { type: 'datasheet_revision', id: rev.id },
        });
      }
      if (beforeCommit) await beforeCommit(tx, written);
      return written;
    });
  } catch (err) {
    if (!store.transactional) await removeQuietly(store, blobKey);
    if (err instanceof StalePlan || isRevisionConflict(err)) return null;
    throw err;
  }
}

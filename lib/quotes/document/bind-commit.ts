import 'server-only';
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { quoteDocuments, quotes } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountKey, sha256Hex, type BlobStore } from '@/lib/blob';
import { logger } from '@/lib/log/logger';
import { contentKeyOf } from './content-key';
import { latestEdition, type QuoteEdition } from './editions';
import { readQuoteSource, type QuoteSource } from './source';

/** Test seam: runs inside the transaction after every write and before commit. */
export type BeforeBindCommit = (tx: Tx, documentId: string) => Promise<void>;

export type BindPlan = {
  user: CurrentUser;
  source: QuoteSource;
  contentKey: string;
  edition: number;
  pageCount: number;
  boundAt: Date;
};

/** The outcome of one attempt: the edition written or found, or 'stale' when the quote changed meanwhile. */
export type CommitOutcome = { edition: QuoteEdition; created: boolean } | 'stale';

function isEditionConflict(err: unknown): boolean {
  const e =
    (err as { cause?: { code?: string; constraint?: string } } | null)?.cause ??
    (err as { code?: string; constraint?: string } | null);
  return e?.code === '23505' && e.constraint === 'quote_documents_edition_uq';
}

/**
 * Writes one edition all or nothing, as issuing a datasheet does: a transactional store writes the bytes inside the
 * transaction; any other store uploads first under a unique key and the object is deleted when nothing is written.
 * Under the quote's row lock the quote is read again: a changed quote makes the plan stale, and an edition of the
 * same content bound meanwhile is answered instead of a duplicate.
 */
export async function commitBind(
  plan: BindPlan,
  bytes: Buffer,
  store: BlobStore,
  beforeCommit?: BeforeBindCommit,
): Promise<CommitOutcome> {
  const { source } = plan;
  const blobKey = accountKey(source.accountId, 'quotes', source.number, `E${plan.edition}-${randomUUID()}.pdf`);
  const sha256 = sha256Hex(bytes);
  if (!store.transactional) await store.put(blobKey, bytes, 'application/pdf');
  let written = false;
  try {
    const outcome = await db.transaction(async (tx): Promise<CommitOutcome> => {
      await tx.select({ id: quotes.id }).from(quotes).where(eq(quotes.id, source.id)).for('update');
      const now = await readQuoteSource(tx, source.id);
      if (!now || contentKeyOf(now) !== plan.contentKey) return 'stale';
      const latest = await latestEdition(tx, source.id);
      if (latest?.contentKey === plan.contentKey) return { edition: latest, created: false };
      if ((latest?.edition ?? 0) + 1 !== plan.edition) return 'stale';
      if (store.transactional) await store.put(blobKey, bytes, 'application/pdf', tx);
      const lines = source.lines.map((l) => ({
        itemId: l.itemId,
        sizingNumber: l.sizingNumber,
        datasheetNumber: l.datasheet?.number ?? null,
        revision: l.datasheet?.revision ?? null,
        revisionId: l.datasheet?.id ?? null,
      }));
      const [row] = await tx
        .insert(quoteDocuments)
        .values({
          quoteId: source.id,
          accountId: source.accountId,
          edition: plan.edition,
          contentKey: plan.contentKey,
          lines,
          pageCount: plan.pageCount,
          blobKey,
          sha256,
          byteSize: bytes.byteLength,
          madeByUserId: plan.user.id,
          madeAt: plan.boundAt,
        })
        .returning({ id: quoteDocuments.id });
      if (!row) throw new Error('quote document insert returned no row');
      await writeAudit(tx, {
        actor: plan.user,
        action: 'quote.document_bound',
        entityType: 'quote_document',
        entityId: row.id,
        accountId: source.accountId,
        detail: {
          quote: source.number,
          edition: plan.edition,
          sha256,
          byteSize: bytes.byteLength,
          pages: plan.pageCount,
          // In words for the audit trail; the ids stay in the row's `lines`.
          datasheets: lines.flatMap((l) => (l.datasheetNumber ? [`${l.datasheetNumber} Rev. ${l.revision}`] : [])),
          store: store.kind,
        },
      });
      if (beforeCommit) await beforeCommit(tx, row.id);
      const edition: QuoteEdition = {
        id: row.id,
        edition: plan.edition,
        pageCount: plan.pageCount,
        byteSize: bytes.byteLength,
        sha256,
        lines,
        madeAt: plan.boundAt,
        madeByName: plan.user.name,
      };
      return { edition, created: true };
    });
    written = outcome !== 'stale' && outcome.created;
    return outcome;
  } catch (err) {
    if (isEditionConflict(err)) return 'stale';
    throw err;
  } finally {
    // The bytes stay only when this attempt wrote the row that names them; the sweep catches any that escape here.
    if (!written && !store.transactional)
      await store
        .delete(blobKey)
        .catch((err: unknown) =>
          logger.error({ err, blobKey }, 'could not delete the blob of an unwritten quote document'),
        );
  }
}

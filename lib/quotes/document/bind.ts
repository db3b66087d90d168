import 'server-only';
import { z } from 'zod';
import { db } from '@/db';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import { can } from '@/lib/auth/roles';
import { getBlobStore, type BlobStore } from '@/lib/blob';
import { readIssuedBytes } from '@/lib/datasheets/download';
import { AppError } from '@/lib/errors';
import { enforce } from '@/lib/ratelimit/limit';
import { commitBind, type BeforeBindCommit } from './bind-commit';
import { contentKeyOf } from './content-key';
import { coverModel } from './cover-model';
import { renderCoverPdf } from './cover';
import { latestEdition, type QuoteEdition } from './editions';
import { bindPdfs, pdfPageCount } from './merge';
import { readQuoteSource, type QuoteSource } from './source';

export type BindOptions = { store?: BlobStore; beforeCommit?: BeforeBindCommit };

const ATTEMPTS = 3;

/** The stored bytes of each line's current datasheet revision, checked against their recorded SHA-256. */
async function datasheetBytes(source: QuoteSource, store: BlobStore): Promise<Map<string, Buffer>> {
  const out = new Map<string, Buffer>();
  for (const l of source.lines) {
    if (!l.datasheet || out.has(l.datasheet.id)) continue;
    out.set(
      l.datasheet.id,
      await readIssuedBytes(store, l.datasheet, `${l.datasheet.number} rev. ${l.datasheet.revision}`),
    );
  }
  return out;
}

async function readBindable(user: CurrentUser, quoteId: string): Promise<QuoteSource> {
  if (!z.uuid().safeParse(quoteId).success) throw new AppError('not_found', 'That quote does not exist.');
  const source = await readQuoteSource(db, quoteId);
  if (!source) throw new AppError('not_found', 'That quote does not exist.');
  assertAccountAccess(user, source.accountId);
  if (source.status === 'draft')
    throw new AppError(
      'conflict',
      `Quote ${source.number} is a draft. Send it to the customer first: the PDF is the quote as the customer has it.`,
    );
  if (!source.lines.length) throw new AppError('unprocessable', `Quote ${source.number} has no lines to put in a PDF.`);
  return source;
}

/**
 * Binds the quote into one PDF (cover sheet, then every page of each line's current datasheet revision) and stores
 * it as the next edition, for vendor staff and sent quotes only. When neither the quote nor any current revision has
 * changed since the latest edition, that edition is answered (`created: false`) and nothing new is written.
 */
export async function bindQuoteDocument(
  user: CurrentUser,
  quoteId: string,
  opts: BindOptions = {},
): Promise<{ edition: QuoteEdition; created: boolean }> {
  if (!can(user.role, 'quote:manage'))
    throw new AppError('forbidden', 'Only vendor staff who manage quotes can put a quote PDF together.');
  const store = opts.store ?? getBlobStore();
  for (let attempt = 0; attempt < ATTEMPTS; attempt++) {
    const source = await readBindable(user, quoteId);
    const contentKey = contentKeyOf(source);
    const latest = await latestEdition(db, quoteId);
    if (latest?.contentKey === contentKey) return { edition: latest, created: false };
    // Rendering costs what a datasheet issue does, so it spends the same per-person budget.
    if (attempt === 0) await enforce('quote PDFs', ['datasheet.user', user.id]);
    const sheets = await datasheetBytes(source, store);
    const pageCounts = new Map<string, number>();
    for (const [id, bytes] of sheets) pageCounts.set(id, await pdfPageCount(bytes));
    const edition = (latest?.edition ?? 0) + 1;
    const boundAt = new Date();
    const cover = await renderCoverPdf(coverModel(source, edition, boundAt, pageCounts), boundAt);
    const order = source.lines.flatMap((l) => (l.datasheet ? [sheets.get(l.datasheet.id)!] : []));
    const { bytes, pageCount } = await bindPdfs(cover, order, {
      title: `${source.number} Edition ${edition} ${source.title}`,
      subject: `Quote for ${source.accountName}`,
      boundAt,
    });
    const out = await commitBind(
      { user, source, contentKey, edition, pageCount, boundAt },
      bytes,
      store,
      opts.beforeCommit,
    );
    if (out !== 'stale') return out;
  }
  throw new AppError(
    'conflict',
    'The quote or its datasheets changed while its PDF was being put together; try again.',
  );
}

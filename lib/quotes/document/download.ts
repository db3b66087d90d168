import 'server-only';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db';
import { quoteDocuments, quotes } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can, isStaff } from '@/lib/auth/roles';
import { getEntitlement } from '@/lib/billing/entitlements';
import { getBlobStore, type BlobStore } from '@/lib/blob';
import { readIssuedBytes } from '@/lib/datasheets/download';
import { AppError } from '@/lib/errors';
import type { PdfDownload } from '@/lib/http/pdf-download';

/** The same outcomes as a datasheet download. */
export type QuoteDocumentDownload = PdfDownload;

export const QUOTE_PDF_LOCKED_MESSAGE =
  'Quote PDFs carry the datasheets issued to your account, so they unlock with an active subscription. Subscribe on the billing page (/billing) to download them.';

/**
 * One edition's bytes under the rules datasheet downloads follow: staff always; customers only for their own
 * account's sent quotes (anything else answers not-found) and only while entitled ('locked' otherwise). Audited.
 */
export async function getQuoteDocumentDownload(
  user: CurrentUser,
  documentId: string,
  opts: { store?: BlobStore } = {},
): Promise<QuoteDocumentDownload> {
  if (!can(user.role, 'quote:read')) throw new AppError('forbidden', 'Your role does not allow reading quotes.');
  if (!z.uuid().safeParse(documentId).success) return { status: 'not-found' };
  const [row] = await db
    .select({
      id: quoteDocuments.id,
      edition: quoteDocuments.edition,
      blobKey: quoteDocuments.blobKey,
      sha256: quoteDocuments.sha256,
      accountId: quoteDocuments.accountId,
      number: quotes.number,
      status: quotes.status,
    })
    .from(quoteDocuments)
    .innerJoin(quotes, eq(quotes.id, quoteDocuments.quoteId))
    .where(eq(quoteDocuments.id, documentId))
    .limit(1);
  if (!row) return { status: 'not-found' };
  if (!isStaff(user.role)) {
    if (user.accountId !== row.accountId || row.status === 'draft') return { status: 'not-found' };
    if (!(await getEntitlement(row.accountId)).unlocked) return { status: 'locked', message: QUOTE_PDF_LOCKED_MESSAGE };
  }
  const bytes = await readIssuedBytes(opts.store ?? getBlobStore(), row, `${row.number} edition ${row.edition}`);
  await db.transaction(async (tx) => {
    await writeAudit(tx, {
      actor: user,
      action: 'quote.document_downloaded',
      entityType: 'quote_document',
      entityId: row.id,
      accountId: row.accountId,
      detail: { quote: row.number, edition: row.edition, sha256: row.sha256 },
    });
  });
  return { status: 'ok', bytes, fileName: `${row.number}-edition${row.edition}.pdf`, sha256: row.sha256 };
}

import 'server-only';
import { desc, eq } from 'drizzle-orm';
import { db, type Db, type Tx } from '@/db';
import { quoteDocuments, users } from '@/db/schema';
import type { QuoteDocumentLine } from '@/db/schema/quotes';
import type { CurrentUser } from '@/lib/auth/current-user';
import { getQuote } from '../queries';

/** One stored edition as the quote page lists it. */
export type QuoteEdition = {
  id: string;
  edition: number;
  pageCount: number;
  byteSize: number;
  sha256: string;
  lines: QuoteDocumentLine[];
  madeAt: Date;
  madeByName: string | null;
};

const columns = {
  id: quoteDocuments.id,
  edition: quoteDocuments.edition,
  pageCount: quoteDocuments.pageCount,
  byteSize: quoteDocuments.byteSize,
  sha256: quoteDocuments.sha256,
  lines: quoteDocuments.lines,
  madeAt: quoteDocuments.madeAt,
  madeByName: users.name,
};

/** Every edition of a quote's document, newest first (callers have already checked the quote is theirs to read). */
export async function listEditions(exec: Db | Tx, quoteId: string): Promise<QuoteEdition[]> {
  return exec
    .select(columns)
    .from(quoteDocuments)
    .leftJoin(users, eq(users.id, quoteDocuments.madeByUserId))
    .where(eq(quoteDocuments.quoteId, quoteId))
    .orderBy(desc(quoteDocuments.edition));
}

/** The newest edition with the content key it was bound from, or null before the first. */
export async function latestEdition(
  exec: Db | Tx,
  quoteId: string,
): Promise<(QuoteEdition & { contentKey: string }) | null> {
  const [row] = await exec
    .select({ ...columns, contentKey: quoteDocuments.contentKey })
    .from(quoteDocuments)
    .leftJoin(users, eq(users.id, quoteDocuments.madeByUserId))
    .where(eq(quoteDocuments.quoteId, quoteId))
    .orderBy(desc(quoteDocuments.edition))
    .limit(1);
  return row ?? null;
}

/** The editions of a quote the user may read (the quote itself is checked as the quote page checks it). */
export async function listQuoteEditions(user: CurrentUser, quoteId: string): Promise<QuoteEdition[]> {
  await getQuote(user, quoteId);
  return listEditions(db, quoteId);
}

/** The editions of a quote the caller has already read with `getQuote` (the quote page), without reading it again. */
export const listEditionsOfReadQuote = (quote: { id: string }): Promise<QuoteEdition[]> => listEditions(db, quote.id);

import 'server-only';
import { asc, eq, inArray } from 'drizzle-orm';
import type { Db, Tx } from '@/db';
import { accounts, datasheetRevisions, datasheets, quoteItems, quotes, sizings } from '@/db/schema';
import { compareRevisionLetters } from '@/lib/datasheets/revision-letter';
import type { SizingWarning } from '@/lib/engine';

/** The current (latest issued) revision of a line's datasheet: the one a quote document appends. */
export type CurrentRevision = { id: string; number: string; revision: string; blobKey: string; sha256: string };

export type SourceLine = {
  itemId: string;
  sizingNumber: string;
  sizingVersion: number;
  title: string;
  equipmentTag: string | null;
  service: 'heater' | 'compressor';
  gasLabel: string;
  headlineKw: number;
  quantity: number;
  unitPrice: string | null;
  result: unknown;
  warnings: SizingWarning[];
  datasheet: CurrentRevision | null;
};

/** Everything a quote document prints and appends, read in one go (inside the binding transaction, or before it). */
export type QuoteSource = {
  id: string;
  number: string;
  title: string;
  status: 'draft' | 'sent' | 'won' | 'lost';
  sentAt: Date | null;
  accountId: string;
  accountName: string;
  site: string | null;
  currency: string;
  unitSystem: 'si' | 'us';
  lines: SourceLine[];
};

async function currentRevisions(exec: Db | Tx, sizingIds: string[]): Promise<Map<string, CurrentRevision>> {
  if (!sizingIds.length) return new Map();
  const rows = await exec
    .select({
      sizingId: datasheets.sizingId,
      id: datasheetRevisions.id,
      number: datasheets.number,
      revision: datasheetRevisions.revision,
      blobKey: datasheetRevisions.blobKey,
      sha256: datasheetRevisions.sha256,
    })
    .from(datasheetRevisions)
    .innerJoin(datasheets, eq(datasheets.id, datasheetRevisions.datasheetId))
    .where(inArray(datasheets.sizingId, sizingIds));
  const latest = new Map<string, CurrentRevision>();
  for (const { sizingId, ...r } of rows) {
    const held = latest.get(sizingId);
    // Letters sort in issue order (B before AA); a superseded revision is never the one kept.
    if (!held || compareRevisionLetters(r.revision, held.revision) > 0) latest.set(sizingId, r);
  }
  return latest;
}

/** The quote, its lines in order and each line's current datasheet revision; null when the quote does not exist. */
export async function readQuoteSource(exec: Db | Tx, quoteId: string): Promise<QuoteSource | null> {
  const [q] = await exec
    .select({
      id: quotes.id,
      number: quotes.number,
      title: quotes.title,
      status: quotes.status,
      sentAt: quotes.sentAt,
      accountId: quotes.accountId,
      accountName: accounts.name,
      site: accounts.site,
      currency: accounts.currency,
      unitSystem: accounts.unitSystem,
    })
    .from(quotes)
    .innerJoin(accounts, eq(accounts.id, quotes.accountId))
    .where(eq(quotes.id, quoteId))
    .limit(1);
  if (!q) return null;
  const rows = await exec
    .select({
      itemId: quoteItems.id,
      sizingId: sizings.id,
      sizingNumber: sizings.number,
      sizingVersion: sizings.revision,
      title: sizings.title,
      equipmentTag: sizings.equipmentTag,
      service: sizings.service,
      gasLabel: sizings.gasLabel,
      headlineKw: sizings.headlineKw,
      quantity: quoteItems.quantity,
      unitPrice: quoteItems.unitPrice,
      result: sizings.result,
    })
    .from(quoteItems)
    .innerJoin(sizings, eq(sizings.id, quoteItems.sizingId))
    .where(eq(quoteItems.quoteId, quoteId))
    .orderBy(asc(quoteItems.position), asc(quoteItems.createdAt));
  const revisions = await currentRevisions(
    exec,
    rows.map((r) => r.sizingId),
  );
  const lines = rows.map(({ sizingId, ...r }) => {
    const warnings = (r.result as { warnings?: SizingWarning[] } | null)?.warnings;
    return { ...r, warnings: Array.isArray(warnings) ? warnings : [], datasheet: revisions.get(sizingId) ?? null };
  });
  return { ...q, lines };
}

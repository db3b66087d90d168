import 'server-only';
import { randomUUID } from 'node:crypto';
import { db, type Tx } from '@/db';
import { uploads } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import { can } from '@/lib/auth/roles';
import { assertSubscribed } from '@/lib/billing/entitlements';
import { accountKey, getBlobStore } from '@/lib/blob';
import { addQuoteItems, createQuote } from '@/lib/quotes/mutations';
import { insertSizings, withEquationUsed } from '@/lib/sizings/save';
import { evaluateSheet, type BatchRow } from './evaluate';
import type { SheetRow } from './parse';
import type { BatchTarget } from './schema';

export type BatchSaved = {
  saved: number;
  /** Rows of the sheet that were not sent to be saved (they did not pass the check). */
  skipped: number;
  uploadId: string;
  quoteId: string | null;
  quoteNumber: string | null;
};

async function writeRows(tx: Tx, user: CurrentUser, target: BatchTarget, sized: BatchRow[]) {
  let quote: { id: string; number: string } | null = null;
  if (target.newQuoteTitle)
    quote = await createQuote(user, { accountId: target.accountId, title: target.newQuoteTitle, sizingIds: [] }, tx);
  const quoteId = quote?.id ?? target.quoteId ?? null;
  const saved = await insertSizings(
    tx,
    user,
    sized.map((row) => ({
      meta: {
        accountId: target.accountId,
        quoteId: undefined,
        title: row.meta.title,
        equipmentTag: row.meta.equipmentTag || undefined,
        notes: row.meta.notes || undefined,
      },
      computed: { input: withEquationUsed(row.input, row.result!), result: row.result! },
    })),
  );
  if (quoteId)
    await addQuoteItems(
      tx,
      user,
      quoteId,
      saved.map((s) => s.id),
    );
  return { quoteId, quoteNumber: quote?.number ?? null, numbers: saved.map((s) => s.number) };
}

function refuseFailed(failed: BatchRow[]): never {
  const list = failed
    .slice(0, 5)
    .map((r) => `row ${r.row} (${r.problems.map((p) => `${p.column}: ${p.message}`).join('; ')})`)
    .join(', ');
  throw new AppError(
    'unprocessable',
    `Nothing was saved: ${failed.length === 1 ? 'a row does' : `${failed.length} rows do`} not pass the check: ${list}${failed.length > 5 ? ', …' : ''}. Check the sheet again.`,
  );
}

/**
 * Saves exactly the rows sent (those that passed the desk's last check), the original upload and (for vendor
 * staff) the quote they go on, all or nothing. Rows are sized again here, since the browser is never trusted:
 * if any sent row does not pass, nothing is saved.
 */
export async function saveBatch(
  user: CurrentUser,
  target: BatchTarget,
  checked: readonly SheetRow[],
  file: { name: string; type: string; bytes: Buffer },
  sheetRows = checked.length,
): Promise<BatchSaved> {
  assertAccountAccess(user, target.accountId);
  if ((target.quoteId || target.newQuoteTitle) && !can(user.role, 'quote:manage'))
    throw new AppError('forbidden', 'Only vendor staff put batch rows on a quote.');
  await assertSubscribed(user, 'Batch upload');
  if (target.newQuoteTitle && (target.newQuoteTitle.length < 3 || target.newQuoteTitle.length > 160))
    throw new AppError('invalid_input', 'The quote title needs 3 to 160 characters.', [
      { path: 'newQuoteTitle', message: '3 to 160 characters' },
    ]);
  if (new Set(checked.map((r) => r.row)).size !== checked.length)
    throw new AppError('invalid_input', 'Each row may be sent once; check the sheet again.');
  const sized = evaluateSheet(checked);
  const failed = sized.filter((r) => !r.result || !r.input);
  if (failed.length) refuseFailed(failed);
  if (!sized.length) throw new AppError('unprocessable', 'No checked row was sent: check the sheet, then save.');
  const store = getBlobStore();
  const uploadId = randomUUID();
  const key = accountKey(target.accountId, 'uploads', `${uploadId}.csv`);
  if (!store.transactional) await store.put(key, file.bytes, 'text/csv');
  try {
    const out = await db.transaction(async (tx) => {
      if (store.transactional) await store.put(key, file.bytes, 'text/csv', tx);
      await tx.insert(uploads).values({
        id: uploadId,
        accountId: target.accountId,
        uploadedByUserId: user.id,
        fileName: file.name,
        contentType: 'text/csv',
        byteSize: file.bytes.byteLength,
        blobKey: key,
        rowCount: sheetRows,
      });
      const written = await writeRows(tx, user, target, sized);
      await writeAudit(tx, {
        actor: user,
        action: 'batch.saved',
        entityType: 'upload',
        entityId: uploadId,
        accountId: target.accountId,
        detail: { rows: sheetRows, saved: sized.length, quoteId: written.quoteId, sizings: written.numbers },
      });
      return { quoteId: written.quoteId, quoteNumber: written.quoteNumber };
    });
    return { saved: sized.length, skipped: Math.max(0, sheetRows - sized.length), uploadId, ...out };
  } catch (err) {
    if (!store.transactional) await store.delete(key).catch(() => undefined);
    throw err;
  }
}

import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, quoteItems } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import type { BlobStore } from '@/lib/blob';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { createQuote, sendQuote, setQuoteLinePrice } from '@/lib/quotes/mutations';
import { makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { airTwoStage, nitrogenHeater } from '../datasheets/requests';

/**
 * A sent US-units quote with three lines: a heater whose datasheet has revisions A and B, a compressor at rev A and a
 * heater with no datasheet issued; the first line is priced, three units at USD 1,250.10.
 */
export async function sentQuoteWithDatasheets(opts: { send?: boolean; store?: BlobStore } = {}) {
  const account = await makeAccount('Halverly Glass');
  await db.update(accounts).set({ unitSystem: 'us', currency: 'USD' }).where(eq(accounts.id, account.id));
  const engineer: CurrentUser = await makeUser('sales_engineer');
  const heater = await makeEngineSizing(engineer, account.id, nitrogenHeater, {
    title: 'Kiln gas heater',
    tag: 'EH-8101',
  });
  const compressor = await makeEngineSizing(engineer, account.id, airTwoStage, { title: 'Blower', tag: 'K-8102' });
  const bare = await makeEngineSizing(engineer, account.id, nitrogenHeater, { title: 'Spare heater', tag: 'EH-8103' });
  const heaterA = await issueDatasheet(engineer, { sizingId: heater.id }, { store: opts.store });
  const heaterB = await issueDatasheet(
    engineer,
    { sizingId: heater.id, note: 'Outlet temperature confirmed' },
    { store: opts.store },
  );
  const compressorA = await issueDatasheet(engineer, { sizingId: compressor.id }, { store: opts.store });
  const { id: quoteId } = await createQuote(engineer, {
    accountId: account.id,
    title: 'Kiln line, Z ≈ 0.99 at inlet',
    sizingIds: [heater.id, compressor.id, bare.id],
  });
  const items = await db.select().from(quoteItems).where(eq(quoteItems.quoteId, quoteId));
  const heaterItem = items.find((i) => i.sizingId === heater.id)!;
  await db.update(quoteItems).set({ quantity: 3 }).where(eq(quoteItems.id, heaterItem.id));
  await setQuoteLinePrice(engineer, { quoteId, itemId: heaterItem.id, unitPrice: '1250.10' });
  if (opts.send !== false) await sendQuote(engineer, quoteId);
  return { account, engineer, quoteId, heater, compressor, bare, heaterA, heaterB, compressorA };
}

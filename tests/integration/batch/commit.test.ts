import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { blobs, quoteItems, sizings, uploads } from '@/db/schema';
import { saveBatch } from '@/lib/batch/commit';
import { createQuote } from '@/lib/quotes/mutations';
import { grantSubscription } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';

const row = (i: number, over: Record<string, string> = {}) => ({
  row: i + 1,
  cells: cellsOf(i, over),
});
const cellsOf = (i: number, over: Record<string, string>) => ({
  service: 'heater',
  title: `Batch heater ${i}`,
  equipment_tag: `BH-${i}`,
  gas: 'air',
  flow_value: String(100 + i),
  flow_unit: 'kg/h',
  inlet_temperature_value: '20',
  inlet_temperature_unit: 'degC',
  inlet_pressure_value: '101.325',
  inlet_pressure_unit: 'kPa',
  outlet_temperature_value: '120',
  outlet_temperature_unit: 'degC',
  ...over,
});
const file = {
  name: 'enquiry.csv',
  type: 'text/csv',
  bytes: Buffer.from('service,title\nheater,original upload bytes\n'),
};

describe('saving a batch', () => {
  it('saves the sized rows, the original upload and a new quote together', async () => {
    const acct = await makeAccount('Batch');
    const engineer = await makeUser('sales_engineer');
    const res = await saveBatch(
      engineer,
      { accountId: acct.id, newQuoteTitle: 'Batch enquiry' },
      [row(1), row(2)],
      file,
      3,
    );
    expect(res).toMatchObject({ saved: 2, skipped: 1 });
    expect(res.quoteNumber).toMatch(/^Q\d{2}-/);
    expect(await db.select().from(sizings).where(eq(sizings.accountId, acct.id))).toHaveLength(2);
    expect(await db.select().from(quoteItems).where(eq(quoteItems.quoteId, res.quoteId!))).toHaveLength(2);
    const [up] = await db.select().from(uploads).where(eq(uploads.id, res.uploadId));
    const [blob] = await db.select().from(blobs).where(eq(blobs.key, up!.blobKey));
    expect(blob!.data.equals(file.bytes)).toBe(true);
    expect(up!.blobKey.startsWith(`accounts/${acct.id}/`)).toBe(true);
  });

  it('saves nothing when a sent row does not pass the check, naming the row', async () => {
    const acct = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    await expect(
      saveBatch(engineer, { accountId: acct.id }, [row(1), row(2), row(3, { flow_unit: '' })], file),
    ).rejects.toThrow(/Nothing was saved: a row does not pass the check: row 4 \(flow_unit/);
    expect(await db.select().from(sizings).where(eq(sizings.accountId, acct.id))).toHaveLength(0);
    expect(await db.select().from(uploads).where(eq(uploads.accountId, acct.id))).toHaveLength(0);
  });

  it('saves nothing at all when any part fails (a quote of another account)', async () => {
    const acct = await makeAccount();
    const other = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    const foreignQuote = await createQuote(engineer, { accountId: other.id, title: 'Not this one', sizingIds: [] });
    await expect(
      saveBatch(engineer, { accountId: acct.id, quoteId: foreignQuote.id }, [row(1), row(2)], file),
    ).rejects.toThrow();
    expect(await db.select().from(sizings).where(eq(sizings.accountId, acct.id))).toHaveLength(0);
    expect(await db.select().from(uploads).where(eq(uploads.accountId, acct.id))).toHaveLength(0);
    expect(await db.select().from(blobs).where(eq(blobs.accountId, acct.id))).toHaveLength(0);
  });

  it('refuses a customer saving into another account or onto a quote', async () => {
    const mine = await makeAccount();
    const other = await makeAccount();
    const customer = await makeUser('customer', mine.id);
    await expect(saveBatch(customer, { accountId: other.id }, [row(1)], file)).rejects.toThrow(/Not found/);
    await expect(saveBatch(customer, { accountId: mine.id, newQuoteTitle: 'Mine' }, [row(1)], file)).rejects.toThrow(
      /vendor staff/,
    );
    // Their own account: only with an active subscription (batch upload is part of the plan).
    await expect(saveBatch(customer, { accountId: mine.id }, [row(1)], file)).rejects.toMatchObject({ status: 402 });
    await grantSubscription(mine.id);
    expect((await saveBatch(customer, { accountId: mine.id }, [row(1)], file)).saved).toBe(1);
  });
});

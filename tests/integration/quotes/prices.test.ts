import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { accounts, auditLog, outbox, quoteItems } from '@/db/schema';
import type { EmailProps } from '@/lib/email/catalogue';
import { createQuote, sendQuote, setQuoteLinePrice } from '@/lib/quotes/mutations';
import { getQuote } from '@/lib/quotes/queries';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

async function pricedQuote(currency = 'USD') {
  const acct = await makeAccount('Priced');
  await db.update(accounts).set({ currency }).where(eq(accounts.id, acct.id));
  const engineer = await makeUser('sales_engineer');
  const s1 = await makeSizingRow(acct.id, engineer.id);
  const s2 = await makeSizingRow(acct.id, engineer.id);
  const { id } = await createQuote(engineer, { accountId: acct.id, title: 'Priced quote', sizingIds: [s1, s2] });
  const items = await db.select().from(quoteItems).where(eq(quoteItems.quoteId, id));
  return { acct, engineer, id, items };
}

const mailFor = async (quoteId: string) =>
  (await db.select().from(outbox).where(eq(outbox.entityId, quoteId))).map(
    (m) => m.payload as EmailProps['quote-sent'],
  );

describe('quote prices', () => {
  it('a draft line takes a unit price, the quote reads it back with the account currency, and empty clears it', async () => {
    const { engineer, id, items } = await pricedQuote('EUR');
    await setQuoteLinePrice(engineer, { quoteId: id, itemId: items[0]!.id, unitPrice: '48200.5' });
    const q = await getQuote(engineer, id);
    expect(q.currency).toBe('EUR');
    expect(q.lines.find((l) => l.itemId === items[0]!.id)?.unitPrice).toBe('48200.50');
    expect(q.lines.find((l) => l.itemId === items[1]!.id)?.unitPrice).toBeNull();
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, id), eq(auditLog.action, 'quote.price_set')));
    expect(audit).toHaveLength(1);
    await setQuoteLinePrice(engineer, { quoteId: id, itemId: items[0]!.id, unitPrice: null });
    expect((await getQuote(engineer, id)).lines.every((l) => l.unitPrice === null)).toBe(true);
  });

  it('refuses a line of another quote and any price change once the quote is sent', async () => {
    const a = await pricedQuote();
    const b = await pricedQuote();
    await expect(
      setQuoteLinePrice(a.engineer, { quoteId: a.id, itemId: b.items[0]!.id, unitPrice: '10' }),
    ).rejects.toThrow(/not on this quote/);
    await sendQuote(a.engineer, a.id);
    await expect(
      setQuoteLinePrice(a.engineer, { quoteId: a.id, itemId: a.items[0]!.id, unitPrice: '10' }),
    ).rejects.toThrow(/prices are fixed once it is sent/);
  });

  it('the quote e-mail carries each priced line amount (quantity × unit price) and the total', async () => {
    const { engineer, id, items } = await pricedQuote('GBP');
    await db.update(quoteItems).set({ quantity: 3 }).where(eq(quoteItems.id, items[0]!.id));
    await setQuoteLinePrice(engineer, { quoteId: id, itemId: items[0]!.id, unitPrice: '1250.10' });
    await sendQuote(engineer, id);
    const [mail] = await mailFor(id);
    const prices = mail!.lines.map((l) => l.price).sort();
    expect(prices).toEqual(['GBP 3,750.30', null].sort());
    expect(mail!.total).toBe('GBP 3,750.30 for the 1 priced line (1 not priced)');
  });
});

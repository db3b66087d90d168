import { eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { auditLog, outbox, quoteItems } from '@/db/schema';
import { getAccount, listAccounts } from '@/lib/accounts/queries';
import { createAccount, inviteMember, acceptInvitation } from '@/lib/accounts/mutations';
import { accountInputSchema } from '@/lib/accounts/schema';
import { createQuote, addQuoteItem, sendQuote, setQuoteStatus } from '@/lib/quotes/mutations';
import { getQuote, listQuotes } from '@/lib/quotes/queries';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

describe('customer accounts are scoped', () => {
  it('a customer lists only their own account; staff list every account', async () => {
    const mine = await makeAccount('Mine');
    const other = await makeAccount('Other');
    const customer = await makeUser('customer', mine.id);
    const engineer = await makeUser('sales_engineer');
    expect((await listAccounts(customer)).map((a) => a.id)).toEqual([mine.id]);
    const seen = (await listAccounts(engineer)).map((a) => a.id);
    expect(seen).toEqual(expect.arrayContaining([mine.id, other.id]));
  });

  it("a customer cannot open another account's details by id", async () => {
    const mine = await makeAccount();
    const other = await makeAccount();
    const customer = await makeUser('customer', mine.id);
    await expect(getAccount(customer, other.id)).rejects.toMatchObject({ code: 'not_found', status: 404 });
    await expect(getAccount(customer, mine.id)).resolves.toMatchObject({ id: mine.id });
  });

  it('creating an account writes its audit entry in the same transaction', async () => {
    const engineer = await makeUser('sales_engineer');
    const { id } = await createAccount(
      engineer,
      // A fresh name each run: a company name that already has an account is refused.
      accountInputSchema.parse({ name: `Audit Check ${randomUUID().slice(0, 8)} Ltd`, barometricPressureKpa: '99.1' }),
    );
    const rows = await db.select().from(auditLog).where(eq(auditLog.entityId, id));
    expect(rows.map((r) => r.action)).toEqual(['account.created']);
    expect(rows[0]?.actorUserId).toBe(engineer.id);
  });

  it('an invitation queues an e-mail and can be accepted exactly once', async () => {
    const acct = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    const email = `invitee-${acct.id.slice(0, 8)}@customer.example`;
    const { inviteUrl } = await inviteMember(engineer, { accountId: acct.id, email });
    const token = inviteUrl.split('/invite/')[1]!;
    const mail = await db.select().from(outbox).where(eq(outbox.toAddress, email));
    expect(mail).toHaveLength(1);
    expect(mail[0]?.template).toBe('invitation');
    const joined = await acceptInvitation(token, 'New Member', 'a-long-password');
    expect(joined.role).toBe('customer');
    expect((await getAccount(engineer, acct.id)).members.map((m) => m.email)).toContain(email);
    await expect(acceptInvitation(token, 'Again', 'a-long-password')).rejects.toThrow(/not valid/);
  });
});

describe('quotes are scoped and keep lines inside their account', () => {
  it("refuses a line that is another account's sizing", async () => {
    const a = await makeAccount();
    const b = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    const foreign = await makeSizingRow(b.id, engineer.id);
    await expect(
      createQuote(engineer, { accountId: a.id, title: 'Cross account', sizingIds: [foreign] }),
    ).rejects.toThrow(/saved to this quote/);
    const { id } = await createQuote(engineer, { accountId: a.id, title: 'Clean quote', sizingIds: [] });
    await expect(addQuoteItem(engineer, id, foreign, 1)).rejects.toThrow(/saved to this quote/);
    expect(await db.select().from(quoteItems).where(eq(quoteItems.quoteId, id))).toHaveLength(0);
  });

  it("a customer sees their account's sent quotes, never drafts, and gets not-found for another's", async () => {
    const a = await makeAccount();
    const b = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    const s1 = await makeSizingRow(a.id, engineer.id);
    const qa = await createQuote(engineer, { accountId: a.id, title: 'For A', sizingIds: [s1] });
    const draft = await createQuote(engineer, { accountId: a.id, title: 'Internal draft', sizingIds: [s1] });
    const qb = await createQuote(engineer, { accountId: b.id, title: 'For B', sizingIds: [] });
    await setQuoteStatus(engineer, qa.id, 'sent');
    const customerA = await makeUser('customer', a.id);
    expect((await listQuotes(customerA)).map((q) => q.id)).toEqual([qa.id]);
    await expect(getQuote(customerA, draft.id)).rejects.toMatchObject({ code: 'not_found' });
    expect((await listQuotes(engineer, { accountId: a.id })).map((q) => q.id).sort()).toEqual([qa.id, draft.id].sort());
    expect((await getQuote(customerA, qa.id)).lines).toHaveLength(1);
    await expect(getQuote(customerA, qb.id)).rejects.toMatchObject({ code: 'not_found', status: 404 });
  });

  it('quote numbers are unique and follow the Qyy-nnnn scheme', async () => {
    const a = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    const made = await Promise.all(
      Array.from({ length: 8 }, (_, i) =>
        createQuote(engineer, { accountId: a.id, title: `Parallel ${i}`, sizingIds: [] }),
      ),
    );
    const numbers = made.map((m) => m.number);
    expect(new Set(numbers).size).toBe(8);
    for (const n of numbers) expect(n).toMatch(/^Q\d{2}-\d{4,}$/);
  });

  it('sending marks the quote sent and queues one e-mail to the billing contact', async () => {
    const a = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    const s1 = await makeSizingRow(a.id, engineer.id);
    const { id } = await createQuote(engineer, { accountId: a.id, title: 'Send me', sizingIds: [s1] });
    const { to } = await sendQuote(engineer, id);
    expect(to).toBe(a.billingContactEmail);
    expect((await getQuote(engineer, id)).status).toBe('sent');
    const mail = await db.select().from(outbox).where(eq(outbox.entityId, id));
    expect(mail.map((m) => m.template)).toEqual(['quote-sent']);
  });
});

import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { subscriptions } from '@/db/schema';
import { getAccount, listAccounts } from '@/lib/accounts/queries';
import { createQuote } from '@/lib/quotes/mutations';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

describe('account counts and subscription state', () => {
  it('shows the same quote, sizing and member counts on the list as on the account page', async () => {
    const acct = await makeAccount('Counted');
    const quiet = await makeAccount('Counted quiet');
    const engineer = await makeUser('sales_engineer');
    await makeUser('customer', acct.id);
    await createQuote(engineer, { accountId: acct.id, title: 'First enquiry', sizingIds: [] });
    await createQuote(engineer, { accountId: acct.id, title: 'Second enquiry', sizingIds: [] });
    await makeSizingRow(acct.id, engineer.id);
    const listed = (await listAccounts(engineer)).find((a) => a.id === acct.id)!;
    expect(listed).toMatchObject({ quoteCount: 2, sizingCount: 1, memberCount: 1, subscription: 'none' });
    const detail = await getAccount(engineer, acct.id);
    expect(detail).toMatchObject({ quoteCount: 2, sizingCount: 1, memberCount: detail.members.length });
    expect((await listAccounts(engineer)).find((a) => a.id === quiet.id)).toMatchObject({ quoteCount: 0 });
  });

  it('reads a paid subscription as Active on both, in Dutywise terms, right after the payment is recorded', async () => {
    const acct = await makeAccount('Paying');
    const engineer = await makeUser('sales_engineer');
    await db.insert(subscriptions).values({
      accountId: acct.id,
      stripeSubscriptionId: `sub_${acct.id}`,
      status: 'active',
      currentPeriodEnd: new Date(Date.now() + 30 * 86_400_000),
    });
    expect((await listAccounts(engineer)).find((a) => a.id === acct.id)!.subscription).toBe('active');
    expect((await getAccount(engineer, acct.id)).subscription).toBe('active');
    await db.insert(subscriptions).values({
      accountId: acct.id,
      stripeSubscriptionId: `sub_late_${acct.id}`,
      status: 'past_due',
      pastDueSince: new Date(),
      updatedAt: new Date(Date.now() + 1000),
    });
    expect((await getAccount(engineer, acct.id)).subscription).toBe('grace');
  });
});

import { eq } from 'drizzle-orm';
import { describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  // Nothing listens here: the payment service is unreachable.
  process.env.STRIPE_API_PORT = '9';
});

import { actAs } from '../helpers/session';
import { startCheckoutAction } from '@/app/(desk)/billing/actions';
import { db } from '@/db';
import { accounts, auditLog, subscriptions } from '@/db/schema';
import { makeAccount, makeUser } from '../helpers/fixtures';

describe('payment service unreachable at checkout', () => {
  it('says so clearly and leaves no half-made state', async () => {
    const acct = await makeAccount('Offline checkout');
    const customer = await makeUser('customer', acct.id);
    await actAs(customer);
    const res = await startCheckoutAction({ plan: 'monthly' });
    expect(res).toMatchObject({ ok: false, status: 503 });
    expect(res.ok ? '' : res.errors[0]?.message).toMatch(/Payments are unavailable right now; nothing was charged/);
    const [row] = await db.select({ c: accounts.stripeCustomerId }).from(accounts).where(eq(accounts.id, acct.id));
    expect(row?.c).toBeNull();
    expect(await db.select().from(subscriptions).where(eq(subscriptions.accountId, acct.id))).toHaveLength(0);
    expect(await db.select().from(auditLog).where(eq(auditLog.accountId, acct.id))).toHaveLength(0);
  });
});

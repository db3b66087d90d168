// Brings the database's payment links into agreement with the local Stripe fake. The fake is the payment record (it
// keeps its state in STRIPE_FAKE_STATE); the database follows it through the sync the webhook uses.
import { and, eq, inArray, isNotNull } from 'drizzle-orm';
import Stripe from 'stripe';
import { db } from '@/db';
import { accounts, subscriptions } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import { stripe } from '@/lib/billing/stripe-client';
import { lockSubscription, storeSubscription } from '@/lib/billing/subscription-sync';

export type DemoBillingReport = { synced: number; unlinked: number; dropped: number; opened: number; refailed: number };

const missing = (err: unknown) => err instanceof Stripe.errors.StripeInvalidRequestError && err.statusCode === 404;
const nowSeconds = () => Math.floor(Date.now() / 1000);

/** Reads the subscription from the fake and stores it as the webhook would; null when the fake no longer holds it. */
export async function pullSubscription(accountId: string, subscriptionId: string): Promise<Stripe.Subscription | null> {
  const sub = await stripe()
    .subscriptions.retrieve(subscriptionId)
    .catch((err: unknown) => {
      if (missing(err)) return null;
      throw err;
    });
  await db.transaction(async (tx) => {
    await lockSubscription(tx, subscriptionId);
    if (sub) return storeSubscription(tx, accountId, sub, nowSeconds());
    await tx.delete(subscriptions).where(eq(subscriptions.stripeSubscriptionId, subscriptionId));
    await writeAudit(tx, {
      actor: null,
      action: 'billing.subscription_dropped',
      entityType: 'account',
      entityId: accountId,
      accountId,
      detail: { subscription: subscriptionId },
    });
  });
  return sub;
}

/** Drops the links of accounts whose customer the fake no longer holds (its state file was removed). */
async function unlinkLost(scope: string[] | 'all', report: DemoBillingReport): Promise<void> {
  const linked = await db
    .select({ id: accounts.id, customer: accounts.stripeCustomerId })
    .from(accounts)
    .where(and(isNotNull(accounts.stripeCustomerId), scope === 'all' ? undefined : inArray(accounts.id, scope)));
  for (const a of linked) {
    const held = await stripe()
      .customers.retrieve(a.customer!)
      .then(() => true)
      .catch((err: unknown) => (missing(err) ? false : Promise.reject(err)));
    if (held) continue;
    report.unlinked += 1;
    await db.transaction(async (tx) => {
      await tx.delete(subscriptions).where(eq(subscriptions.accountId, a.id));
      await tx.update(accounts).set({ stripeCustomerId: null }).where(eq(accounts.id, a.id));
      await writeAudit(tx, {
        actor: null,
        action: 'billing.customer_unlinked',
        entityType: 'account',
        entityId: a.id,
        accountId: a.id,
        detail: { customer: a.customer },
      });
    });
  }
}

/** Brings every stored subscription in scope to the fake's current state, dropping those it no longer holds. */
export async function syncWithFake(scope: string[] | 'all'): Promise<DemoBillingReport> {
  const report: DemoBillingReport = { synced: 0, unlinked: 0, dropped: 0, opened: 0, refailed: 0 };
  await unlinkLost(scope, report);
  const rows = await db
    .select({ accountId: subscriptions.accountId, id: subscriptions.stripeSubscriptionId })
    .from(subscriptions)
    .where(scope === 'all' ? undefined : inArray(subscriptions.accountId, scope));
  for (const row of rows) {
    if (await pullSubscription(row.accountId, row.id)) report.synced += 1;
    else report.dropped += 1;
  }
  return report;
}

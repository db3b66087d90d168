// Gives the scenario's subscription accounts their states in the local Stripe fake and in the database, and keeps the
// two in agreement: db/seed-billing.ts runs it on every demo start, once the fake is up. What visitors did since
// (a cancellation in the portal, a new subscription) is kept; only a state the fake no longer holds is made again.
import { desc, eq, isNotNull } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, subscriptions } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import { entitlementFrom } from '@/lib/billing/entitlements';
import { priceIdFor, stripe } from '@/lib/billing/stripe-client';
import { failFakeRenewal, openFakeSubscription, renewFakeSubscription, resetFake } from './demo-billing-fake';
import { type DemoBillingReport, pullSubscription, syncWithFake } from './demo-billing-sync';

export type DemoBillingState = 'active' | 'past_due' | 'never';
export type DemoBillingSpec = { accountId: string; state: DemoBillingState };

async function latestSubscription(accountId: string) {
  const [row] = await db
    .select()
    .from(subscriptions)
    .where(eq(subscriptions.accountId, accountId))
    .orderBy(desc(subscriptions.updatedAt))
    .limit(1);
  return row ?? null;
}

/** The account's payment customer, created in the fake and linked (with its audit entry) when it has none. */
async function linkCustomer(accountId: string): Promise<string> {
  const [a] = await db
    .select({ name: accounts.name, email: accounts.billingContactEmail, customer: accounts.stripeCustomerId })
    .from(accounts)
    .where(eq(accounts.id, accountId))
    .limit(1);
  if (!a) throw new Error(`demo billing: no account ${accountId}; seed the scenario first (db/seed.ts)`);
  if (a.customer) return a.customer;
  const customer = await stripe().customers.create({
    name: a.name,
    email: a.email ?? undefined,
    metadata: { accountId },
  });
  await db.transaction(async (tx) => {
    await tx.update(accounts).set({ stripeCustomerId: customer.id }).where(eq(accounts.id, accountId));
    await writeAudit(tx, {
      actor: null,
      action: 'billing.customer_created',
      entityType: 'account',
      entityId: accountId,
      accountId,
      detail: { customer: customer.id },
    });
  });
  return customer.id;
}

/** A paid subscription (annual for the active account, monthly for the one whose renewal fails), stored in the database. */
async function openSubscription(spec: DemoBillingSpec): Promise<void> {
  const customer = await linkCustomer(spec.accountId);
  const id = await openFakeSubscription(
    customer,
    priceIdFor(spec.state === 'active' ? 'annual' : 'monthly'),
    spec.accountId,
  );
  if (spec.state === 'past_due') await failFakeRenewal(id);
  await pullSubscription(spec.accountId, id);
}

/**
 * Agreement first (every stored subscription in scope follows the fake), then each spec's state where the account has
 * no subscription: a fresh database, or a fake that lost its state file. A past-due account whose grace has run out
 * since the last start gets a new failed renewal (renewed, then failed again), so the demo shows it within its grace.
 * With `resetFakeWhenUnlinked`, a database that links no customer at all first empties the fake: whatever it holds
 * belongs to an earlier database.
 */
export async function seedDemoBilling(
  specs: DemoBillingSpec[],
  options: { scope: string[] | 'all'; resetFakeWhenUnlinked?: boolean },
): Promise<DemoBillingReport> {
  if (options.resetFakeWhenUnlinked) {
    const [linked] = await db
      .select({ id: accounts.id })
      .from(accounts)
      .where(isNotNull(accounts.stripeCustomerId))
      .limit(1);
    if (!linked) await resetFake();
  }
  const report = await syncWithFake(options.scope);
  for (const spec of specs) {
    if (spec.state === 'never') continue;
    const row = await latestSubscription(spec.accountId);
    if (!row) {
      await openSubscription(spec);
      report.opened += 1;
    } else if (spec.state === 'past_due' && row.status === 'past_due' && !entitlementFrom(row).unlocked) {
      await renewFakeSubscription(row.stripeSubscriptionId);
      await pullSubscription(spec.accountId, row.stripeSubscriptionId);
      await failFakeRenewal(row.stripeSubscriptionId);
      await pullSubscription(spec.accountId, row.stripeSubscriptionId);
      report.refailed += 1;
    }
  }
  return report;
}

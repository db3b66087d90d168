import 'server-only';
import { eq, sql } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { Tx } from '@/db';
import { accounts, subscriptions } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';

/** Period end moved onto subscription items in recent API versions; older payloads keep it on the subscription. */
export function periodEndOf(sub: Stripe.Subscription): Date | null {
  const item = sub.items?.data?.[0] as { current_period_end?: number } | undefined;
  const legacy = (sub as unknown as { current_period_end?: number }).current_period_end;
  const secs = item?.current_period_end ?? legacy;
  return typeof secs === 'number' ? new Date(secs * 1000) : null;
}

/**
 * Holds one subscription's lock until the transaction ends: whoever writes its row (the webhook, the demo seed) reads
 * the service's current state while holding it, so whichever commits last stored the newest state.
 */
export async function lockSubscription(tx: Tx, subscriptionId: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`stripe-subscription:${subscriptionId}`}))`);
}

/** The event names an account that the stored customer link contradicts: refused, nothing is changed. */
export class AccountMismatchError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'AccountMismatchError';
  }
}

/**
 * Finds the Dutywise account for a subscription. The stored link (the customer id saved when checkout created the
 * customer) decides; an account id carried in the event (checkout's client reference, the subscription's metadata)
 * must agree with it, or the event is refused. With no stored link, an id from the event is used only for an account
 * that has no payment customer yet and only when the event names the customer it then links.
 */
export async function accountIdFor(tx: Tx, sub: Stripe.Subscription, hint?: string | null): Promise<string | null> {
  const customer = typeof sub.customer === 'string' ? sub.customer : sub.customer?.id;
  const claimed = [hint, sub.metadata?.accountId].filter((v): v is string => typeof v === 'string' && v.length > 0);
  if (customer) {
    const [linked] = await tx
      .select({ id: accounts.id })
      .from(accounts)
      .where(eq(accounts.stripeCustomerId, customer))
      .limit(1);
    if (linked) {
      const other = claimed.find((c) => c !== linked.id);
      if (other)
        throw new AccountMismatchError(
          `subscription ${sub.id} of customer ${customer} names account ${other}, but that customer belongs to account ${linked.id}`,
        );
      return linked.id;
    }
  }
  const candidate = claimed[0];
  if (!candidate || !/^[0-9a-f-]{36}$/i.test(candidate) || claimed.some((c) => c !== candidate)) return null;
  const [a] = await tx
    .select({ id: accounts.id, customer: accounts.stripeCustomerId })
    .from(accounts)
    .where(eq(accounts.id, candidate))
    .limit(1);
  if (a?.customer)
    throw new AccountMismatchError(`subscription ${sub.id} names account ${a.id}, which pays as another customer`);
  return a?.id ?? null;
}

/**
 * Stores the subscription as the payment service reports it now. Callers pass the freshly retrieved
 * object, so whichever event arrives first or last, the stored row ends in the service's current state.
 */
export async function storeSubscription(
  tx: Tx,
  accountId: string,
  sub: Stripe.Subscription,
  eventCreated: number,
): Promise<void> {
  const customer = typeof sub.customer === 'string' ? sub.customer : (sub.customer?.id ?? null);
  const [prev] = await tx
    .select({ status: subscriptions.status })
    .from(subscriptions)
    .where(eq(subscriptions.stripeSubscriptionId, sub.id))
    .limit(1);
  const values = {
    accountId,
    stripeCustomerId: customer,
    stripeSubscriptionId: sub.id,
    status: sub.status,
    priceId: sub.items?.data?.[0]?.price?.id ?? null,
    currentPeriodEnd: periodEndOf(sub),
    cancelAtPeriodEnd: Boolean(sub.cancel_at_period_end),
    lastEventCreated: eventCreated,
    updatedAt: new Date(),
  };
  await tx
    .insert(subscriptions)
    .values({ ...values, pastDueSince: sub.status === 'past_due' ? new Date() : null })
    .onConflictDoUpdate({
      target: subscriptions.stripeSubscriptionId,
      set: {
        ...values,
        lastEventCreated: sql`greatest(${subscriptions.lastEventCreated}, ${eventCreated})`,
        // Grace is counted from the first failure, not from each retry's event.
        pastDueSince: sub.status === 'past_due' ? sql`coalesce(${subscriptions.pastDueSince}, now())` : null,
      },
    });
  if (prev?.status !== sub.status) {
    await writeAudit(tx, {
      actor: null,
      action: 'billing.subscription_status',
      entityType: 'account',
      entityId: accountId,
      accountId,
      detail: { subscription: sub.id, from: prev?.status ?? null, to: sub.status },
    });
  }
}

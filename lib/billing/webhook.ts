import 'server-only';
import { eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import { db } from '@/db';
import { accounts, webhookEvents } from '@/db/schema';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { stripe } from './stripe-client';
import { accountIdFor, lockSubscription, periodEndOf, storeSubscription } from './subscription-sync';

export const handledEventTypes = [
  'checkout.session.completed',
  'customer.subscription.created',
  'customer.subscription.updated',
  'customer.subscription.deleted',
  'invoice.paid',
  'invoice.payment_failed',
] as const;
type Handled = (typeof handledEventTypes)[number];

export function isHandled(type: string): type is Handled {
  return (handledEventTypes as readonly string[]).includes(type);
}

function subscriptionIdOf(event: Stripe.Event): string | null {
  const obj = event.data.object as unknown as Record<string, unknown>;
  if (event.type.startsWith('customer.subscription.')) return String(obj.id);
  if (event.type === 'checkout.session.completed')
    return typeof obj.subscription === 'string'
      ? obj.subscription
      : ((obj.subscription as { id?: string } | null)?.id ?? null);
  // Invoices name their subscription at the top level in older versions, under parent details in newer ones.
  const parent = (obj.parent as { subscription_details?: { subscription?: string } } | undefined)?.subscription_details
    ?.subscription;
  return parent ?? (typeof obj.subscription === 'string' ? obj.subscription : null);
}

/**
 * Applies one verified event. Returns 'duplicate' when the event id was seen before. The event id is
 * recorded in the same transaction as its effects, so a failure leaves nothing recorded and a retry redoes it.
 */
export async function applyStripeEvent(event: Stripe.Event): Promise<'applied' | 'duplicate' | 'ignored'> {
  if (!isHandled(event.type)) return 'ignored';
  const subId = subscriptionIdOf(event);
  const hint =
    event.type === 'checkout.session.completed'
      ? ((event.data.object as Stripe.Checkout.Session).client_reference_id ?? null)
      : null;
  return db.transaction(async (tx) => {
    // Events of one subscription are applied one at a time, each reading the subscription's current state while it
    // holds the lock: whichever commits last stored the newest state, so no older status can be left behind.
    if (subId) await lockSubscription(tx, subId);
    const inserted = await tx
      .insert(webhookEvents)
      .values({ id: event.id, source: 'stripe', type: event.type })
      .onConflictDoNothing()
      .returning({ id: webhookEvents.id });
    if (!inserted.length) return 'duplicate';
    const sub = subId ? await stripe().subscriptions.retrieve(subId) : null;
    if (!sub) return 'applied';
    const accountId = await accountIdFor(tx, sub, hint);
    if (!accountId) throw new Error(`no Dutywise account for subscription ${sub.id}`);
    await storeSubscription(tx, accountId, sub, event.created);
    const [acct] = await tx
      .select({ name: accounts.name, email: accounts.billingContactEmail })
      .from(accounts)
      .where(eq(accounts.id, accountId))
      .limit(1);
    const to = acct?.email;
    if (to && event.type === 'invoice.payment_failed') {
      const invoiceId = (event.data.object as { id?: string }).id ?? event.id;
      await enqueueEmail(tx, {
        template: 'payment-failed',
        to,
        accountId,
        dedupeKey: `payment-failed:${invoiceId}`,
        props: { accountName: acct.name, billingUrl: `${env.APP_URL}/billing`, graceDays: env.BILLING_GRACE_DAYS },
      });
    }
    if (to && sub.cancel_at_period_end && sub.status !== 'canceled') {
      const end = periodEndOf(sub);
      if (end) {
        await enqueueEmail(tx, {
          template: 'subscription-ending',
          to,
          accountId,
          dedupeKey: `ending:${sub.id}:${end.getTime()}`,
          props: {
            accountName: acct.name,
            periodEnd: end.toISOString().slice(0, 10),
            billingUrl: `${env.APP_URL}/billing`,
          },
        });
      }
    }
    return 'applied';
  });
}

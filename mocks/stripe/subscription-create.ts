import type { FakeContext } from './context';
import { newId, nowSeconds } from './ids';
import { addInterval } from './periods';
import type { InvoiceRecord, LineItemRecord, SubscriptionRecord } from './records';
import { requirePrice } from './render-context';

/** Issues an invoice for the subscription's current period; the number runs per fake instance. */
export function createInvoice(
  ctx: FakeContext,
  sub: SubscriptionRecord,
  billingReason: InvoiceRecord['billingReason'],
  status: InvoiceRecord['status'],
  invoicedPeriod: { start: number; end: number },
): InvoiceRecord {
  const now = nowSeconds();
  ctx.store.state.invoiceCounter += 1;
  const lines = sub.items.map((item) => ({
    id: newId('il'),
    priceId: item.priceId,
    quantity: item.quantity,
    amountMinor: requirePrice(ctx, item.priceId).unitAmountMinor * item.quantity,
    periodStart: sub.currentPeriodStart,
    periodEnd: sub.currentPeriodEnd,
    subscriptionItemId: item.id,
  }));
  const invoice: InvoiceRecord = {
    id: newId('in'),
    number: `DWLOCAL-${String(ctx.store.state.invoiceCounter).padStart(4, '0')}`,
    created: now,
    customerId: sub.customerId,
    subscriptionId: sub.id,
    status,
    billingReason,
    currency: sub.currency,
    totalMinor: lines.reduce((sum, line) => sum + line.amountMinor, 0),
    attemptCount: 1,
    periodStart: invoicedPeriod.start,
    periodEnd: invoicedPeriod.end,
    paidAt: status === 'paid' ? now : null,
    lines,
  };
  ctx.store.state.invoices[invoice.id] = invoice;
  sub.latestInvoiceId = invoice.id;
  return invoice;
}

export type NewSubscription = {
  customerId: string;
  lineItems: Pick<LineItemRecord, 'priceId' | 'quantity'>[];
  metadata: Record<string, string>;
};

/**
 * Starts an active subscription for one period of its first price and bills it with a paid first invoice: what a
 * paid checkout creates, and what the demo's seeding control creates without one. Saves nothing and emits nothing;
 * the caller does both, in its own order.
 */
export function openSubscription(
  ctx: FakeContext,
  input: NewSubscription,
): { sub: SubscriptionRecord; invoice: InvoiceRecord } {
  const now = nowSeconds();
  const first = input.lineItems[0];
  if (!first) throw new Error(`A subscription for ${input.customerId} needs at least one line item`);
  const seed = requirePrice(ctx, first.priceId);
  const sub: SubscriptionRecord = {
    id: newId('sub'),
    created: now,
    customerId: input.customerId,
    status: 'active',
    items: input.lineItems.map((item) => ({
      id: newId('si', 14),
      created: now,
      priceId: item.priceId,
      quantity: item.quantity,
    })),
    metadata: { ...input.metadata },
    currency: seed.currency,
    startDate: now,
    billingCycleAnchor: now,
    currentPeriodStart: now,
    currentPeriodEnd: addInterval(now, seed.interval, seed.intervalCount ?? 1),
    cancelAtPeriodEnd: false,
    cancelAt: null,
    canceledAt: null,
    endedAt: null,
    latestInvoiceId: null,
  };
  ctx.store.state.subscriptions[sub.id] = sub;
  // Stripe's first subscription invoice covers an instant (period start = end = creation) [mem].
  const invoice = createInvoice(ctx, sub, 'subscription_create', 'paid', { start: now, end: now });
  return { sub, invoice };
}

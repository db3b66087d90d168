import type { FakeContext } from './context';
import { emitEvent } from './events';
import { newId, nowSeconds } from './ids';
import { addInterval } from './periods';
import type { CustomerRecord, InvoiceRecord, SessionRecord, SubscriptionRecord } from './records';
import { requirePrice } from './render-context';
import { renderSession } from './render-checkout';
import { renderInvoice, renderSubscription } from './render-billing';

/** Creates a customer record (shared by the API and by checkout for new payers). */
export function createCustomer(
  ctx: FakeContext,
  fields: Partial<Omit<CustomerRecord, 'id' | 'created'>>,
): CustomerRecord {
  const customer: CustomerRecord = {
    id: newId('cus', 14),
    created: nowSeconds(),
    email: fields.email ?? null,
    name: fields.name ?? null,
    description: fields.description ?? null,
    phone: fields.phone ?? null,
    metadata: fields.metadata ?? {},
  };
  ctx.store.state.customers[customer.id] = customer;
  return customer;
}

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

/**
 * Settles a session paid with the success card: customer, subscription and first invoice, then
 * the events in the order Dutywise's webhook must cope with. Returns the event ids.
 */
export function completeCheckout(
  ctx: FakeContext,
  session: SessionRecord,
  payer: { email: string; name: string },
): string[] {
  const state = ctx.store.state;
  const now = nowSeconds();
  let customer = session.customerId ? state.customers[session.customerId] : undefined;
  if (!customer) customer = createCustomer(ctx, { email: payer.email, name: payer.name });
  if (!customer.email) customer.email = payer.email;
  if (!customer.name) customer.name = payer.name;

  const first = session.lineItems[0];
  if (!first) throw new Error(`Session ${session.id} has no line items`);
  const seed = requirePrice(ctx, first.priceId);
  const periodEnd = addInterval(now, seed.interval, seed.intervalCount ?? 1);
  const sub: SubscriptionRecord = {
    id: newId('sub'),
    created: now,
    customerId: customer.id,
    status: 'active',
    items: session.lineItems.map((item) => ({
      id: newId('si', 14),
      created: now,
      priceId: item.priceId,
      quantity: item.quantity,
    })),
    metadata: { ...session.subscriptionMetadata },
    currency: session.currency,
    startDate: now,
    billingCycleAnchor: now,
    currentPeriodStart: now,
    currentPeriodEnd: periodEnd,
    cancelAtPeriodEnd: false,
    cancelAt: null,
    canceledAt: null,
    endedAt: null,
    latestInvoiceId: null,
  };
  state.subscriptions[sub.id] = sub;
  // Stripe's first subscription invoice covers an instant (period start = end = creation) [mem].
  const invoice = createInvoice(ctx, sub, 'subscription_create', 'paid', { start: now, end: now });

  session.status = 'complete';
  session.paymentStatus = 'paid';
  session.customerId = customer.id;
  session.subscriptionId = sub.id;
  session.invoiceId = invoice.id;
  session.customerDetails = { email: customer.email ?? payer.email, name: payer.name };
  ctx.store.save();

  return [
    emitEvent(ctx, 'customer.subscription.created', renderSubscription(ctx, sub)).id,
    emitEvent(ctx, 'checkout.session.completed', renderSession(ctx, session)).id,
    emitEvent(ctx, 'invoice.paid', renderInvoice(ctx, invoice)).id,
  ];
}

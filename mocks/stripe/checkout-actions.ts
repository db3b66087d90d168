import type { FakeContext } from './context';
import { emitEvent } from './events';
import { newId, nowSeconds } from './ids';
import type { CustomerRecord, SessionRecord } from './records';
import { openSubscription } from './subscription-create';
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
  let customer = session.customerId ? state.customers[session.customerId] : undefined;
  if (!customer) customer = createCustomer(ctx, { email: payer.email, name: payer.name });
  if (!customer.email) customer.email = payer.email;
  if (!customer.name) customer.name = payer.name;

  const { sub, invoice } = openSubscription(ctx, {
    customerId: customer.id,
    lineItems: session.lineItems,
    metadata: session.subscriptionMetadata,
  });

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

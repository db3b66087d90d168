import { noSuch, noSuchParam } from './api-error';
import type { FakeContext } from './context';
import { emitEvent } from './events';
import { json, type Route, route } from './http-util';
import { assertKnownParams, optionalMetadata, requiredString } from './params';
import { requireSubscription } from './lookup';
import type { EventRecord } from './records';
import { renderInvoice, renderSubscription } from './render-billing';
import { advancePeriodEnd, endSubscription, failPayment } from './subscription-actions';
import { openSubscription } from './subscription-create';

/** An event's identity and delivery state, without its payload, for /_control/events. */
export function eventSummary(event: EventRecord) {
  const object = event.object;
  return {
    id: event.id,
    type: event.type,
    created: event.created,
    objectId: object.id ?? null,
    delivery: { ...event.delivery },
  };
}

/** Resets the delivery record and queues the same event (same id) again. */
export function resendEvent(ctx: FakeContext, id: string): EventRecord {
  const event = ctx.store.findEvent(id);
  if (!event) throw noSuch('event', id);
  event.delivery.status = 'pending';
  ctx.store.save();
  ctx.sender.enqueue(event.id);
  return event;
}

/** Test and demo controls; the hosted service has no equivalent, so they live under /_control/. */
export function controlRoutes(ctx: FakeContext, onReset: () => void): Route[] {
  const subscriptionReply = (id: string) => json(renderSubscription(ctx, requireSubscription(ctx, id)));
  return [
    route('GET', '/_control/health', () =>
      json({
        ok: true,
        service: 'stripe-fake',
        subscriptions: Object.keys(ctx.store.state.subscriptions).length,
        events: ctx.store.state.events.length,
      }),
    ),
    route('GET', '/_control/events', ({ url }) => {
      const type = url.searchParams.get('type');
      const events = ctx.store.state.events.filter((event) => !type || event.type === type);
      return json({ data: events.map(eventSummary) });
    }),
    route('POST', '/_control/events/:id/resend', ({ params }) => json(eventSummary(resendEvent(ctx, params[0] ?? '')))),
    // The demo seed's way to a paying customer without driving the checkout page: an active subscription with a
    // paid first invoice, announced by the events a checkout would send about it.
    route('POST', '/_control/customers/:id/subscriptions', ({ params, body }) => {
      assertKnownParams(body, ['price', 'metadata']);
      const customerId = params[0] ?? '';
      if (!ctx.store.state.customers[customerId]) throw noSuch('customer', customerId);
      const priceId = requiredString(body, 'price', 200);
      if (!ctx.catalogue.find(priceId)) throw noSuchParam('price', priceId, 'price');
      const { sub, invoice } = openSubscription(ctx, {
        customerId,
        lineItems: [{ priceId, quantity: 1 }],
        metadata: optionalMetadata(body, 'metadata') ?? {},
      });
      ctx.store.save();
      emitEvent(ctx, 'customer.subscription.created', renderSubscription(ctx, sub));
      emitEvent(ctx, 'invoice.paid', renderInvoice(ctx, invoice));
      return subscriptionReply(sub.id);
    }),
    route('POST', '/_control/subscriptions/:id/advance-period-end', ({ params }) => {
      const id = params[0] ?? '';
      advancePeriodEnd(ctx, requireSubscription(ctx, id));
      return subscriptionReply(id);
    }),
    route('POST', '/_control/subscriptions/:id/fail-payment', ({ params }) => {
      const id = params[0] ?? '';
      failPayment(ctx, requireSubscription(ctx, id));
      return subscriptionReply(id);
    }),
    route('POST', '/_control/subscriptions/:id/end', ({ params }) => {
      const id = params[0] ?? '';
      endSubscription(ctx, requireSubscription(ctx, id));
      return subscriptionReply(id);
    }),
    route('POST', '/_control/reset', () => {
      onReset();
      return json({ ok: true });
    }),
  ];
}

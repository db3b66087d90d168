import { noSuch } from './api-error';
import type { FakeContext } from './context';
import { expandObject } from './expand';
import { nowSeconds } from './ids';
import type { CustomerRecord, SessionRecord, SubscriptionRecord } from './records';
import { renderInvoice, renderSubscription } from './render-billing';
import { renderCustomer, renderSession } from './render-checkout';
import { type JsonObject, toJson } from './wire-types';

export function requireCustomer(ctx: FakeContext, id: string): CustomerRecord {
  const customer = ctx.store.state.customers[id];
  if (!customer) throw noSuch('customer', id);
  return customer;
}

export function requireSubscription(ctx: FakeContext, id: string): SubscriptionRecord {
  const sub = ctx.store.state.subscriptions[id];
  if (!sub) throw noSuch('subscription', id);
  return sub;
}

/** The session, marked expired once its expiry has passed unpaid. */
export function requireSession(ctx: FakeContext, id: string): SessionRecord {
  const session = ctx.store.state.sessions[id];
  if (!session) throw noSuch('checkout.session', id);
  if (session.status === 'open' && session.expiresAt < nowSeconds()) {
    session.status = 'expired';
    ctx.store.save();
  }
  return session;
}

/** Renders whatever the fake holds under an id, for `expand[]`. */
export function resolveById(ctx: FakeContext, id: string): JsonObject | undefined {
  const state = ctx.store.state;
  const pick = <T>(record: T | undefined, render: (r: T) => unknown) => (record ? toJson(render(record)) : undefined);
  if (id.startsWith('cus_')) return pick(state.customers[id], renderCustomer);
  if (id.startsWith('sub_')) return pick(state.subscriptions[id], (s) => renderSubscription(ctx, s));
  if (id.startsWith('in_')) return pick(state.invoices[id], (i) => renderInvoice(ctx, i));
  if (id.startsWith('cs_')) return pick(state.sessions[id], (s) => renderSession(ctx, s));
  const product = id.startsWith('prod_') ? ctx.catalogue.findProduct(id) : undefined;
  if (product) return toJson(ctx.catalogue.renderProduct(product));
  return pick(ctx.catalogue.find(id), (p) => ctx.catalogue.renderPrice(p));
}

/** Renders to JSON and applies the request's expand paths. */
export function withExpand(ctx: FakeContext, object: unknown, paths: string[]): JsonObject {
  return expandObject(toJson(object), paths, (id) => resolveById(ctx, id));
}

import { badParam, noSuch, noSuchParam } from './api-error';
import { createCustomer } from './checkout-actions';
import { readCheckoutParams } from './checkout-params';
import type { FakeContext } from './context';
import { json, type Route, route } from './http-util';
import { newId, nowSeconds } from './ids';
import { requireSession, requireSubscription } from './lookup';
import {
  assertKnownParams,
  optionalEmail,
  optionalMetadata,
  optionalString,
  optionalUrl,
  requiredString,
} from './params';
import type { PortalSessionRecord, SessionRecord } from './records';
import { renderSubscription } from './render-billing';
import { renderCustomer, renderPortalSession, renderSession } from './render-checkout';

// Accepted so the app may send them; the fake has no use for them.
const CUSTOMER_IGNORED = ['address', 'preferred_locales', 'shipping', 'tax_exempt'];
const CUSTOMER_PARAMS = ['email', 'name', 'description', 'phone', 'metadata', ...CUSTOMER_IGNORED];
// The portal's look and behaviour are fixed in the fake; these change nothing there.
const PORTAL_IGNORED = ['configuration', 'locale', 'on_behalf_of'];

function newSession(ctx: FakeContext, body: Parameters<typeof readCheckoutParams>[1]): SessionRecord {
  const now = nowSeconds();
  const params = readCheckoutParams(ctx, body, now);
  return {
    id: newId('cs_test', 58),
    created: now,
    expiresAt: params.expiresAt,
    status: 'open',
    paymentStatus: 'unpaid',
    customerId: params.customerId,
    customerEmail: params.customerEmail,
    customerDetails: null,
    clientReferenceId: params.clientReferenceId,
    metadata: params.metadata,
    subscriptionMetadata: params.subscriptionMetadata,
    lineItems: params.lineItems,
    currency: params.seeds[0]?.currency ?? 'eur',
    amountTotalMinor: params.lineItems.reduce(
      (sum, item, i) => sum + (params.seeds[i]?.unitAmountMinor ?? 0) * item.quantity,
      0,
    ),
    successUrl: params.successUrl,
    cancelUrl: params.cancelUrl,
    subscriptionId: null,
    invoiceId: null,
  };
}

/**
 * The API calls Dutywise makes (create a customer, a checkout session and a portal session; read a
 * subscription), the one the browser journeys add (read a checkout session) and the one the demo seed adds (read a
 * customer, to see whether the fake still holds it). Nothing else is served.
 */
export function apiRoutes(ctx: FakeContext): Route[] {
  return [
    route('POST', '/v1/customers', ({ body }) => {
      assertKnownParams(body, CUSTOMER_PARAMS);
      const customer = createCustomer(ctx, {
        email: optionalEmail(body, 'email') ?? null,
        name: optionalString(body, 'name', 256) ?? null,
        description: optionalString(body, 'description', 350) ?? null,
        phone: optionalString(body, 'phone', 20) ?? null,
        metadata: optionalMetadata(body, 'metadata') ?? {},
      });
      ctx.store.save();
      return json(renderCustomer(customer));
    }),
    route('GET', '/v1/customers/:id', ({ params, body }) => {
      assertKnownParams(body, []);
      const customer = ctx.store.state.customers[params[0] ?? ''];
      if (!customer) throw noSuch('customer', params[0] ?? '');
      return json(renderCustomer(customer));
    }),
    route('POST', '/v1/checkout/sessions', ({ body }) => {
      const session = newSession(ctx, body);
      ctx.store.state.sessions[session.id] = session;
      ctx.store.save();
      return json(renderSession(ctx, session));
    }),
    route('GET', '/v1/checkout/sessions/:id', ({ params, body }) => {
      assertKnownParams(body, []);
      return json(renderSession(ctx, requireSession(ctx, params[0] ?? '')));
    }),
    route('GET', '/v1/subscriptions/:id', ({ params, body }) => {
      assertKnownParams(body, []);
      return json(renderSubscription(ctx, requireSubscription(ctx, params[0] ?? '')));
    }),
    route('POST', '/v1/billing_portal/sessions', ({ body }) => {
      assertKnownParams(body, ['customer', 'return_url', 'flow_data', ...PORTAL_IGNORED]);
      if (body.flow_data !== undefined)
        throw badParam('flow_data', 'The local Stripe fake has one portal page; flow_data is not supported.');
      const customerId = requiredString(body, 'customer', 200);
      if (!ctx.store.state.customers[customerId]) throw noSuchParam('customer', customerId, 'customer');
      const portal: PortalSessionRecord = {
        id: newId('bps'),
        created: nowSeconds(),
        customerId,
        returnUrl: optionalUrl(body, 'return_url') ?? null,
      };
      ctx.store.state.portalSessions[portal.id] = portal;
      ctx.store.save();
      return json(renderPortalSession(ctx, portal));
    }),
  ];
}

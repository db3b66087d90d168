import { badParam, noSuch, noSuchParam } from './api-error';
import type { FakeContext } from './context';
import { renderEvent } from './events';
import { json, type Route, route } from './http-util';
import { newId, nowSeconds } from './ids';
import { withExpand } from './lookup';
import { assertKnownParams, expandParam, optionalUrl, requiredString } from './params';
import type { PortalSessionRecord } from './records';
import { renderInvoice } from './render-billing';
import { renderPortalSession } from './render-checkout';

// The portal's look and behaviour are fixed in the fake; these change nothing there.
const PORTAL_IGNORED = ['configuration', 'locale', 'on_behalf_of'];

export function billingRoutes(ctx: FakeContext): Route[] {
  return [
    route('POST', '/v1/billing_portal/sessions', ({ body }) => {
      assertKnownParams(body, ['customer', 'return_url', 'flow_data', 'expand', ...PORTAL_IGNORED]);
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
      return json(withExpand(ctx, renderPortalSession(ctx, portal), expandParam(body)));
    }),
    route('GET', '/v1/invoices/:id', ({ params, body }) => {
      assertKnownParams(body, ['expand']);
      const id = params[0] ?? '';
      const invoice = ctx.store.state.invoices[id];
      if (!invoice) throw noSuch('invoice', id);
      return json(withExpand(ctx, renderInvoice(ctx, invoice), expandParam(body)));
    }),
    route('GET', '/v1/events/:id', ({ params, body }) => {
      assertKnownParams(body, ['expand']);
      const id = params[0] ?? '';
      const event = ctx.store.findEvent(id);
      if (!event) throw noSuch('event', id);
      return json(renderEvent(event));
    }),
  ];
}

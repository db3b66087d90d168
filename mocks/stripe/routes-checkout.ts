import type { FakeContext } from './context';
import { readCheckoutParams } from './checkout-params';
import { json, type Route, route } from './http-util';
import { newId, nowSeconds } from './ids';
import { requireSession, withExpand } from './lookup';
import { assertKnownParams, expandParam } from './params';
import type { SessionRecord } from './records';
import { renderLineItems, renderSession } from './render-checkout';
import { toJson } from './wire-types';

/** Renders a session, attaching `line_items` when asked (Stripe only includes it on expand). */
function sessionReply(ctx: FakeContext, session: SessionRecord, expand: string[]) {
  const rendered = toJson(renderSession(ctx, session));
  if (expand.includes('line_items')) rendered.line_items = toJson(renderLineItems(ctx, session));
  return json(
    withExpand(
      ctx,
      rendered,
      expand.filter((path) => path !== 'line_items'),
    ),
  );
}

export function checkoutRoutes(ctx: FakeContext): Route[] {
  return [
    route('POST', '/v1/checkout/sessions', ({ body }) => {
      const now = nowSeconds();
      const params = readCheckoutParams(ctx, body, now);
      const session: SessionRecord = {
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
        trialPeriodDays: params.trialPeriodDays,
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
      ctx.store.state.sessions[session.id] = session;
      ctx.store.save();
      return sessionReply(ctx, session, expandParam(body));
    }),
    route('GET', '/v1/checkout/sessions/:id', ({ params, body }) => {
      assertKnownParams(body, ['expand']);
      return sessionReply(ctx, requireSession(ctx, params[0] ?? ''), expandParam(body));
    }),
    route('GET', '/v1/checkout/sessions/:id/line_items', ({ params, body }) => {
      assertKnownParams(body, ['expand', 'limit', 'starting_after', 'ending_before']);
      return json(toJson(renderLineItems(ctx, requireSession(ctx, params[0] ?? ''))));
    }),
  ];
}

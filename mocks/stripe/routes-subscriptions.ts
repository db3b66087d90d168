import { badParam } from './api-error';
import type { FakeContext } from './context';
import { json, type Route, route } from './http-util';
import { listReply } from './list-reply';
import { requireSubscription, withExpand } from './lookup';
import {
  assertKnownParams,
  expandParam,
  mergeMetadata,
  optionalBoolean,
  optionalMetadata,
  optionalString,
} from './params';
import { renderSubscription } from './render-billing';
import { cancelSubscriptionNow, updateSubscription } from './subscription-actions';

const LIST_PARAMS = ['customer', 'status', 'price', 'limit', 'starting_after', 'ending_before', 'expand'];
// Accepted and ignored: proration and collection settings make no difference to a fake charge.
const UPDATE_PARAMS = ['cancel_at_period_end', 'metadata', 'expand', 'proration_behavior', 'cancellation_details'];
const CANCEL_PARAMS = ['invoice_now', 'prorate', 'cancellation_details', 'expand'];
const STATUSES = [
  'active',
  'trialing',
  'past_due',
  'canceled',
  'all',
  'ended',
  'incomplete',
  'incomplete_expired',
  'unpaid',
  'paused',
];

export function subscriptionRoutes(ctx: FakeContext): Route[] {
  return [
    route('GET', '/v1/subscriptions', ({ body }) => {
      assertKnownParams(body, LIST_PARAMS);
      const customer = optionalString(body, 'customer', 200);
      const status = optionalString(body, 'status', 30);
      const price = optionalString(body, 'price', 200);
      if (status !== undefined && !STATUSES.includes(status))
        throw badParam('status', `Invalid status: '${status}' (one of ${STATUSES.join(', ')}).`);
      const expand = expandParam(body).map((path) => path.replace(/^data\./, ''));
      const matches = Object.values(ctx.store.state.subscriptions)
        .filter((sub) => !customer || sub.customerId === customer)
        .filter((sub) => !price || sub.items.some((item) => item.priceId === price))
        // Stripe's default list leaves canceled subscriptions out [mem].
        .filter((sub) =>
          status === undefined
            ? sub.status !== 'canceled'
            : status === 'all' || sub.status === status || (status === 'ended' && sub.status === 'canceled'),
        )
        .sort((a, b) => b.created - a.created)
        .map((sub) => withExpand(ctx, renderSubscription(ctx, sub), expand));
      return json(listReply(matches, body, '/v1/subscriptions'));
    }),
    route('GET', '/v1/subscriptions/:id', ({ params, body }) => {
      assertKnownParams(body, ['expand']);
      const sub = requireSubscription(ctx, params[0] ?? '');
      return json(withExpand(ctx, renderSubscription(ctx, sub), expandParam(body)));
    }),
    route('POST', '/v1/subscriptions/:id', ({ params, body }) => {
      assertKnownParams(body, UPDATE_PARAMS);
      const sub = requireSubscription(ctx, params[0] ?? '');
      const metadata = optionalMetadata(body, 'metadata');
      updateSubscription(ctx, sub, {
        cancelAtPeriodEnd: optionalBoolean(body, 'cancel_at_period_end'),
        metadata: metadata ? mergeMetadata(sub.metadata, metadata) : undefined,
      });
      return json(withExpand(ctx, renderSubscription(ctx, sub), expandParam(body)));
    }),
    route('DELETE', '/v1/subscriptions/:id', ({ params, body }) => {
      assertKnownParams(body, CANCEL_PARAMS);
      const sub = requireSubscription(ctx, params[0] ?? '');
      cancelSubscriptionNow(ctx, sub);
      return json(withExpand(ctx, renderSubscription(ctx, sub), expandParam(body)));
    }),
  ];
}

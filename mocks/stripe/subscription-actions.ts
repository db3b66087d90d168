import { StripeApiError } from './api-error';
import type { FakeContext } from './context';
import { createInvoice } from './subscription-create';
import { emitEvent, previousAttributes } from './events';
import { nowSeconds } from './ids';
import { addInterval } from './periods';
import type { SubscriptionRecord } from './records';
import { renderInvoice, renderSubscription } from './render-billing';
import { requirePrice } from './render-context';
import { toJson } from './wire-types';

function refuseIfCanceled(sub: SubscriptionRecord): void {
  if (sub.status === 'canceled') {
    throw new StripeApiError(
      400,
      'invalid_request_error',
      `Subscription ${sub.id} is canceled; a canceled subscription cannot be changed.`,
      'subscription',
    );
  }
}

/** Runs a change and, if the rendered subscription differs, sends customer.subscription.updated. */
function changeSubscription(ctx: FakeContext, sub: SubscriptionRecord, change: () => void): void {
  const before = toJson(renderSubscription(ctx, sub));
  change();
  const after = toJson(renderSubscription(ctx, sub));
  const changed = previousAttributes(before, after);
  ctx.store.save();
  if (Object.keys(changed).length > 0) emitEvent(ctx, 'customer.subscription.updated', after, changed);
}

export type SubscriptionUpdate = { cancelAtPeriodEnd?: boolean; metadata?: Record<string, string> };

/** Applies an API or portal update; setting cancel_at_period_end also sets cancel_at, as Stripe does. */
export function updateSubscription(ctx: FakeContext, sub: SubscriptionRecord, update: SubscriptionUpdate): void {
  if (update.cancelAtPeriodEnd !== undefined) refuseIfCanceled(sub);
  changeSubscription(ctx, sub, () => {
    if (update.metadata) sub.metadata = update.metadata;
    if (update.cancelAtPeriodEnd !== undefined) {
      sub.cancelAtPeriodEnd = update.cancelAtPeriodEnd;
      sub.cancelAt = update.cancelAtPeriodEnd ? sub.currentPeriodEnd : null;
      sub.canceledAt = update.cancelAtPeriodEnd ? nowSeconds() : null;
    }
  });
}

/** Ends a subscription now (customer.subscription.deleted), as cancelling it without waiting for the period end does. */
export function endSubscription(ctx: FakeContext, sub: SubscriptionRecord): void {
  const now = nowSeconds();
  sub.status = 'canceled';
  sub.canceledAt = sub.canceledAt ?? now;
  sub.endedAt = now;
  ctx.store.save();
  emitEvent(ctx, 'customer.subscription.deleted', renderSubscription(ctx, sub));
}

/**
 * Simulates reaching the period end: a subscription set to cancel ends; any other renews for
 * one more interval with a paid invoice (a past-due one counts as recovered by that payment).
 */
export function advancePeriodEnd(ctx: FakeContext, sub: SubscriptionRecord): void {
  refuseIfCanceled(sub);
  if (sub.cancelAtPeriodEnd) {
    endSubscription(ctx, sub);
    return;
  }
  const first = sub.items[0];
  if (!first) throw new Error(`Subscription ${sub.id} has no items`);
  const seed = requirePrice(ctx, first.priceId);
  const ended = { start: sub.currentPeriodStart, end: sub.currentPeriodEnd };
  const before = toJson(renderSubscription(ctx, sub));
  sub.currentPeriodStart = ended.end;
  sub.currentPeriodEnd = addInterval(ended.end, seed.interval, seed.intervalCount ?? 1);
  sub.status = 'active';
  // A renewal invoice bills the new period in advance and names the ended one as its period [mem].
  const invoice = createInvoice(ctx, sub, 'subscription_cycle', 'paid', ended);
  const after = toJson(renderSubscription(ctx, sub));
  ctx.store.save();
  emitEvent(ctx, 'invoice.paid', renderInvoice(ctx, invoice));
  emitEvent(ctx, 'customer.subscription.updated', after, previousAttributes(before, after));
}

/** Simulates a failed renewal charge: an open invoice, status past_due. */
export function failPayment(ctx: FakeContext, sub: SubscriptionRecord): void {
  refuseIfCanceled(sub);
  const before = toJson(renderSubscription(ctx, sub));
  const invoice = createInvoice(ctx, sub, 'subscription_cycle', 'open', {
    start: sub.currentPeriodStart,
    end: sub.currentPeriodEnd,
  });
  sub.status = 'past_due';
  const after = toJson(renderSubscription(ctx, sub));
  ctx.store.save();
  emitEvent(ctx, 'invoice.payment_failed', renderInvoice(ctx, invoice));
  emitEvent(ctx, 'customer.subscription.updated', after, previousAttributes(before, after));
}

import type Stripe from 'stripe';
import { type RenderContext, requirePrice } from './render-context';
import type { InvoiceRecord, SubscriptionRecord } from './records';
import type { WireShape } from './wire-types';

// Newer API versions moved the period to subscription items; the fake also keeps it on the
// subscription itself so code written either way reads the same value.
type PeriodFields = { current_period_start: number; current_period_end: number };
export type WireSubscription = WireShape<Stripe.Subscription> & PeriodFields;

export function renderSubscription(ctx: RenderContext, sub: SubscriptionRecord): WireSubscription {
  const items = sub.items.map((item) => {
    const seed = requirePrice(ctx, item.priceId);
    return {
      id: item.id,
      object: 'subscription_item' as const,
      billing_thresholds: null,
      created: item.created,
      current_period_start: sub.currentPeriodStart,
      current_period_end: sub.currentPeriodEnd,
      discounts: [],
      metadata: {},
      plan: ctx.catalogue.renderPlan(seed),
      price: ctx.catalogue.renderPrice(seed) as WireShape<Stripe.Price>,
      quantity: item.quantity,
      subscription: sub.id,
      tax_rates: [],
    };
  });
  return {
    id: sub.id,
    object: 'subscription',
    application: null,
    application_fee_percent: null,
    automatic_tax: { disabled_reason: null, enabled: false, liability: null },
    billing_cycle_anchor: sub.billingCycleAnchor,
    billing_cycle_anchor_config: null,
    billing_thresholds: null,
    cancel_at: sub.cancelAt,
    cancel_at_period_end: sub.cancelAtPeriodEnd,
    canceled_at: sub.canceledAt,
    cancellation_details: {
      comment: null,
      feedback: null,
      reason: sub.cancelAtPeriodEnd || sub.status === 'canceled' ? 'cancellation_requested' : null,
    },
    collection_method: 'charge_automatically',
    created: sub.created,
    currency: sub.currency,
    current_period_start: sub.currentPeriodStart,
    current_period_end: sub.currentPeriodEnd,
    customer: sub.customerId,
    customer_account: null,
    days_until_due: null,
    default_payment_method: null,
    default_source: null,
    description: null,
    discounts: [],
    ended_at: sub.endedAt,
    items: { object: 'list', data: items, has_more: false, url: `/v1/subscription_items?subscription=${sub.id}` },
    latest_invoice: sub.latestInvoiceId,
    livemode: false,
    metadata: sub.metadata,
    pause_collection: null,
    pending_setup_intent: null,
    pending_update: null,
    schedule: null,
    start_date: sub.startDate,
    status: sub.status,
    test_clock: null,
    trial_end: null,
    trial_start: null,
  };
}

export function renderInvoice(ctx: RenderContext, invoice: InvoiceRecord): WireShape<Stripe.Invoice> {
  const customer = ctx.store.state.customers[invoice.customerId];
  const sub = ctx.store.state.subscriptions[invoice.subscriptionId];
  const paid = invoice.status === 'paid';
  const lines = invoice.lines.map((line) => {
    const seed = requirePrice(ctx, line.priceId);
    return {
      id: line.id,
      object: 'line_item' as const,
      amount: line.amountMinor,
      currency: invoice.currency,
      description: `${line.quantity} × ${seed.productName}`,
      discount_amounts: [],
      discountable: true,
      discounts: [],
      invoice: invoice.id,
      livemode: false,
      metadata: {},
      parent: {
        type: 'subscription_item_details',
        invoice_item_details: null,
        subscription_item_details: {
          invoice_item: null,
          proration: false,
          proration_details: { credited_items: null },
          subscription: invoice.subscriptionId,
          subscription_item: line.subscriptionItemId,
        },
      },
      period: { start: line.periodStart, end: line.periodEnd },
      pretax_credit_amounts: [],
      quantity: line.quantity,
      subscription: invoice.subscriptionId,
      subtotal: line.amountMinor,
      taxes: [],
    };
  });
  return {
    id: invoice.id,
    object: 'invoice',
    account_country: 'DE',
    account_name: 'Dutywise (local test)',
    amount_due: invoice.totalMinor,
    amount_overpaid: 0,
    amount_paid: paid ? invoice.totalMinor : 0,
    amount_remaining: paid ? 0 : invoice.totalMinor,
    amount_shipping: 0,
    attempt_count: invoice.attemptCount,
    attempted: invoice.attemptCount > 0,
    billing_reason: invoice.billingReason,
    collection_method: 'charge_automatically',
    created: invoice.created,
    currency: invoice.currency,
    customer: invoice.customerId,
    customer_email: customer?.email ?? null,
    customer_name: customer?.name ?? null,
    description: null,
    due_date: null,
    effective_at: invoice.created,
    hosted_invoice_url: null,
    invoice_pdf: null,
    lines: { object: 'list', data: lines, has_more: false, url: `/v1/invoices/${invoice.id}/lines` },
    livemode: false,
    metadata: {},
    // Retries of a failed renewal are what Stripe schedules next; three days is its usual first step [mem].
    next_payment_attempt: paid ? null : invoice.created + 3 * 86_400,
    number: invoice.number,
    parent: {
      type: 'subscription_details',
      quote_details: null,
      subscription_details: { metadata: sub?.metadata ?? {}, subscription: invoice.subscriptionId },
    },
    period_end: invoice.periodEnd,
    period_start: invoice.periodStart,
    status: invoice.status,
    status_transitions: {
      finalized_at: invoice.created,
      marked_uncollectible_at: null,
      paid_at: invoice.paidAt,
      voided_at: null,
    },
    subtotal: invoice.totalMinor,
    total: invoice.totalMinor,
    webhooks_delivered_at: null,
  };
}

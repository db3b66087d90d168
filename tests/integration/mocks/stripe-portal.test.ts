import type Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { control, type Harness, startHarness, subscribe, waitUntil } from './stripe-harness';

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.close();
});

function isoDate(seconds: number): string {
  return new Date(seconds * 1000).toISOString().slice(0, 10);
}

async function openPortal(customerId: string) {
  const portal = await h.stripe.billingPortal.sessions.create({
    customer: customerId,
    return_url: 'http://localhost:3000/billing',
  });
  return portal;
}

/** Posts one of the portal page's buttons, as the browser would. */
function pressPortalButton(portal: Stripe.BillingPortal.Session, subscriptionId: string, action: 'cancel' | 'resume') {
  return fetch(`${portal.url}/subscriptions/${subscriptionId}/${action}`, { method: 'POST', redirect: 'manual' });
}

async function nextEvent(type: string, after: number): Promise<Stripe.Event> {
  await waitUntil(() => h.receiver.events.slice(after).some((e) => e.type === type), type);
  const event = h.receiver.events.slice(after).find((e) => e.type === type);
  if (!event) throw new Error(`no ${type}`);
  return event;
}

describe('customer portal page', () => {
  it('shows plan, status and period end, and links back', async () => {
    const { customerId, subscriptionId } = await subscribe(h);
    const sub = await h.stripe.subscriptions.retrieve(subscriptionId);
    const portal = await openPortal(customerId);
    expect(portal.id).toMatch(/^bps_/);
    expect(portal.url).toBe(`${h.fake.publicBaseUrl}/manage/${portal.id}`);
    const markup = await (await fetch(portal.url)).text();
    expect(markup).toContain('Desk monthly');
    expect(markup).toContain('Active');
    expect(markup).toContain(`Renews ${isoDate(sub.items.data[0]?.current_period_end ?? 0)}`);
    expect(markup).toContain('Cancel at period end');
    expect(markup).toContain('href="http://localhost:3000/billing"');
  });

  it('cancels at period end, then resumes, each with customer.subscription.updated', async () => {
    const { customerId, subscriptionId } = await subscribe(h);
    const portal = await openPortal(customerId);
    let seen = h.receiver.events.length;

    const cancel = await pressPortalButton(portal, subscriptionId, 'cancel');
    expect(cancel.status).toBe(303);
    const updated = await nextEvent('customer.subscription.updated', seen);
    expect((updated.data.object as Stripe.Subscription).cancel_at_period_end).toBe(true);
    expect(updated.data.previous_attributes).toMatchObject({ cancel_at_period_end: false });
    const sub = await h.stripe.subscriptions.retrieve(subscriptionId);
    expect(sub.cancel_at_period_end).toBe(true);
    expect(sub.status).toBe('active');
    expect(sub.cancel_at).toBe(sub.items.data[0]?.current_period_end);
    const page = await (
      await fetch(
        cancel.headers.get('location') ? new URL(cancel.headers.get('location') ?? '', portal.url) : portal.url,
      )
    ).text();
    expect(page).toContain('Resume');
    expect(page).toContain('will not renew');
    expect(page).toContain('role="status"');

    seen = h.receiver.events.length;
    expect((await pressPortalButton(portal, subscriptionId, 'resume')).status).toBe(303);
    const resumed = await nextEvent('customer.subscription.updated', seen);
    expect((resumed.data.object as Stripe.Subscription).cancel_at_period_end).toBe(false);
    expect((await h.stripe.subscriptions.retrieve(subscriptionId)).cancel_at).toBeNull();
  });

  it("refuses to change another customer's subscription", async () => {
    const mine = await subscribe(h);
    const other = await h.stripe.customers.create({ email: 'other@fenwick-compression.example' });
    const portal = await openPortal(other.id);
    const response = await pressPortalButton(portal, mine.subscriptionId, 'cancel');
    expect(response.status).toBe(404);
    expect((await h.stripe.subscriptions.retrieve(mine.subscriptionId)).cancel_at_period_end).toBe(false);
  });
});

describe('period end and payment controls', () => {
  it('ends a subscription set to cancel and sends customer.subscription.deleted', async () => {
    const { customerId, subscriptionId } = await subscribe(h);
    await pressPortalButton(await openPortal(customerId), subscriptionId, 'cancel');
    const seen = h.receiver.events.length;
    const advanced = await control(h.fake, `subscriptions/${subscriptionId}/advance-period-end`);
    expect(advanced.status).toBe(200);
    expect(advanced.body.status).toBe('canceled');
    const deleted = await nextEvent('customer.subscription.deleted', seen);
    expect((deleted.data.object as Stripe.Subscription).id).toBe(subscriptionId);
    const sub = await h.stripe.subscriptions.retrieve(subscriptionId);
    expect(sub.status).toBe('canceled');
    expect(sub.ended_at).not.toBeNull();
    expect((await control(h.fake, `subscriptions/${subscriptionId}/advance-period-end`)).status).toBe(400);
  });

  it('renews for another period with invoice.paid then customer.subscription.updated', async () => {
    const { subscriptionId } = await subscribe(h);
    const before = await h.stripe.subscriptions.retrieve(subscriptionId);
    const oldEnd = before.items.data[0]?.current_period_end ?? 0;
    const seen = h.receiver.events.length;
    await control(h.fake, `subscriptions/${subscriptionId}/advance-period-end`);
    await waitUntil(() => h.receiver.events.length >= seen + 2, 'renewal events');
    expect(h.receiver.events.slice(seen).map((e) => e.type)).toEqual(['invoice.paid', 'customer.subscription.updated']);
    const after = await h.stripe.subscriptions.retrieve(subscriptionId);
    expect(after.status).toBe('active');
    expect(after.items.data[0]?.current_period_start).toBe(oldEnd);
    expect(after.items.data[0]?.current_period_end).toBeGreaterThan(oldEnd);
    const invoice = h.receiver.events[seen]?.data.object as Stripe.Invoice;
    expect(invoice.billing_reason).toBe('subscription_cycle');
    expect(invoice.lines.data[0]?.period.start).toBe(oldEnd);
  });

  it('marks a failed renewal past_due with invoice.payment_failed', async () => {
    const { subscriptionId } = await subscribe(h);
    const seen = h.receiver.events.length;
    const failed = await control(h.fake, `subscriptions/${subscriptionId}/fail-payment`);
    expect(failed.body.status).toBe('past_due');
    await waitUntil(() => h.receiver.events.length >= seen + 2, 'payment failure events');
    const [invoiceEvent, updated] = h.receiver.events.slice(seen);
    expect(invoiceEvent?.type).toBe('invoice.payment_failed');
    const invoice = invoiceEvent?.data.object as Stripe.Invoice;
    expect(invoice.status).toBe('open');
    expect(invoice.amount_remaining).toBe(29_000);
    expect(updated?.type).toBe('customer.subscription.updated');
    expect(updated?.data.previous_attributes).toMatchObject({ status: 'active' });
    expect((await h.stripe.subscriptions.retrieve(subscriptionId)).status).toBe('past_due');
  });
});

describe('portal sessions', () => {
  it('refuses a portal session for an unknown customer', async () => {
    await expect(h.stripe.billingPortal.sessions.create({ customer: 'cus_nobody' })).rejects.toMatchObject({
      statusCode: 400,
      param: 'customer',
    });
  });
});

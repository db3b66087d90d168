import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  control,
  createDeskCheckout,
  DECLINE_CARD,
  type Harness,
  payHostedCheckout,
  startHarness,
  SUCCESS_CARD,
  WEBHOOK_SECRET,
  waitUntil,
} from './stripe-harness';

/** The expected end of a period of `months` calendar months, clamped to shorter months [cp]. */
function calendarMonthsLater(startSeconds: number, months: number): { year: number; month: number; day: number } {
  const start = new Date(startSeconds * 1000);
  const target = start.getUTCMonth() + months;
  const year = start.getUTCFullYear() + Math.floor(target / 12);
  const month = target % 12;
  const lastDay = new Date(Date.UTC(year, month + 1, 0)).getUTCDate();
  return { year, month, day: Math.min(start.getUTCDate(), lastDay) };
}

function calendarParts(seconds: number) {
  const d = new Date(seconds * 1000);
  return { year: d.getUTCFullYear(), month: d.getUTCMonth(), day: d.getUTCDate() };
}

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.close();
});

describe('hosted checkout with the success card', () => {
  it('creates an open session with a local payment page', async () => {
    const session = await createDeskCheckout(h.stripe);
    expect(session.object).toBe('checkout.session');
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.status).toBe('open');
    expect(session.payment_status).toBe('unpaid');
    expect(session.amount_total).toBe(29_000);
    expect(session.currency).toBe('eur');
    expect(session.client_reference_id).toBe('acct_7f3a');
    expect(session.url).toBe(`${h.fake.publicBaseUrl}/pay/${session.id}`);

    const page = await fetch(session.url ?? '');
    const markup = await page.text();
    expect(page.status).toBe(200);
    expect(markup).toContain('LOCAL TEST PAYMENT PAGE');
    for (const name of ['email', 'cardNumber', 'expiry', 'cvc', 'name']) expect(markup).toContain(`name="${name}"`);
    expect(markup).toContain('€290.00');
  });

  it('completes, redirects to success_url and sends verified events in order', async () => {
    const session = await createDeskCheckout(h.stripe);
    const response = await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe(`http://localhost:3000/billing/complete?session=${session.id}`);

    await waitUntil(() => h.receiver.events.length >= 3, 'three webhook events');
    expect(h.receiver.events.map((e) => e.type)).toEqual([
      'customer.subscription.created',
      'checkout.session.completed',
      'invoice.paid',
    ]);
    expect(h.receiver.deliveries.every((d) => d.verified)).toBe(true);
    for (const event of h.receiver.events) {
      expect(event.id).toMatch(/^evt_/);
      expect(event.object).toBe('event');
      expect(event.api_version).toBe(Stripe.API_VERSION);
      expect(event.livemode).toBe(false);
    }

    const done = await h.stripe.checkout.sessions.retrieve(session.id);
    expect(done.status).toBe('complete');
    expect(done.payment_status).toBe('paid');
    expect(done.url).toBeNull();
    expect(String(done.customer)).toMatch(/^cus_/);
    const sub = await h.stripe.subscriptions.retrieve(String(done.subscription));
    expect(sub.id).toMatch(/^sub_/);
    expect(sub.status).toBe('active');
    expect(sub.metadata).toEqual({ accountId: 'acct_7f3a', plan: 'price_desk_monthly' });
    expect(sub.customer).toBe(done.customer);

    const [created, completed, paid] = h.receiver.events;
    const completedSession = completed?.data.object as Stripe.Checkout.Session;
    expect(completedSession.subscription).toBe(sub.id);
    expect(completedSession.client_reference_id).toBe('acct_7f3a');
    expect(completedSession.metadata).toEqual({ accountId: 'acct_7f3a' });
    expect((created?.data.object as Stripe.Subscription).id).toBe(sub.id);
    const invoice = paid?.data.object as Stripe.Invoice;
    expect(invoice.id).toMatch(/^in_/);
    expect(invoice.status).toBe('paid');
    expect(invoice.amount_paid).toBe(29_000);
    expect(invoice.parent?.subscription_details?.subscription).toBe(sub.id);
  });

  it('sets a one-month period on the subscription and on its item', async () => {
    const session = await createDeskCheckout(h.stripe);
    await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    const done = await h.stripe.checkout.sessions.retrieve(session.id);
    const sub = await h.stripe.subscriptions.retrieve(String(done.subscription));
    const item = sub.items.data[0];
    expect(item?.price.id).toBe('price_desk_monthly');
    const start = item?.current_period_start ?? 0;
    const end = item?.current_period_end ?? 0;
    expect(calendarParts(end)).toEqual(calendarMonthsLater(start, 1));
    const legacy = sub as unknown as { current_period_start: number; current_period_end: number };
    expect(legacy.current_period_start).toBe(start);
    expect(legacy.current_period_end).toBe(end);
  });

  it('bills the annual price for a calendar year', async () => {
    const session = await createDeskCheckout(h.stripe, 'price_desk_annual');
    expect(session.amount_total).toBe(290_000);
    await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    const done = await h.stripe.checkout.sessions.retrieve(session.id);
    const item = (await h.stripe.subscriptions.retrieve(String(done.subscription))).items.data[0];
    expect(calendarParts(item?.current_period_end ?? 0)).toEqual(
      calendarMonthsLater(item?.current_period_start ?? 0, 12),
    );
  });

  it('signs events so that a wrong secret fails verification', async () => {
    const session = await createDeskCheckout(h.stripe);
    await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    const first = h.fake.events()[0];
    expect(first).toBeDefined();
    const payload = JSON.stringify({ id: first?.id, object: 'event' });
    const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_someone_else' });
    expect(() => h.stripe.webhooks.constructEvent(payload, header, WEBHOOK_SECRET)).toThrow();
  });

  it('shows an already-paid page when the form is posted again, with no new events', async () => {
    const session = await createDeskCheckout(h.stripe);
    await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    const again = await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    expect(again.status).toBe(409);
    expect(await again.text()).toContain('Already paid');
    expect(h.fake.events()).toHaveLength(3);
  });
});

describe('hosted checkout refusals', () => {
  it('declines 4000 0000 0000 0002 with an alert and changes nothing', async () => {
    const session = await createDeskCheckout(h.stripe);
    const response = await payHostedCheckout(session.url ?? '', DECLINE_CARD);
    const markup = await response.text();
    expect(response.status).toBe(402);
    expect(markup).toMatch(/<div class="alert" role="alert">Your card was declined\.<\/div>/);
    expect(markup).not.toContain('4000 0000 0000 0002" aria');
    const after = await h.stripe.checkout.sessions.retrieve(session.id);
    expect(after.status).toBe('open');
    expect(after.subscription).toBeNull();
    expect(h.fake.events()).toHaveLength(0);
    expect((await control(h.fake, 'health', 'GET')).body.subscriptions).toBe(0);
  });

  it.each([
    ['cardNumber', '1234 5678 9012 3456', 'check digit'],
    ['cardNumber', '4242', '12 to 19 digits'],
    ['cardNumber', '5555 5555 5555 4444', 'only the test cards'],
    ['expiry', '01/20', 'expired'],
    ['expiry', '13/40', '01 to 12'],
    ['cvc', '12', '3 or 4 digits'],
    ['email', 'not-an-email', 'email address'],
    ['name', '', 'name on the card'],
  ])('rejects %s %j with a field message', async (field, value, message) => {
    const session = await createDeskCheckout(h.stripe, 'price_desk_monthly', { customer_email: undefined });
    const card = field === 'cardNumber' ? value : SUCCESS_CARD;
    const response = await payHostedCheckout(session.url ?? '', card, field === 'cardNumber' ? {} : { [field]: value });
    const markup = await response.text();
    expect(response.status).toBe(422);
    expect(markup).toContain(`id="field-${field}-error"`);
    expect(markup).toContain(message);
    expect(h.fake.events()).toHaveLength(0);
  });
});

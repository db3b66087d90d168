import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { type Harness, startHarness, waitUntil } from './stripe-harness';

// The fake's seeding control (POST /_control/customers/:id/subscriptions) and the customer read the demo seed uses.

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.close();
});

const control = (path: string, form: Record<string, string>) =>
  fetch(`${h.fake.url}/_control/${path}`, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(form).toString(),
  });

describe('seeding a subscription without a checkout', () => {
  it('opens an active subscription for one period with a paid first invoice and announces it', async () => {
    const customer = await h.stripe.customers.create({ name: 'Pellby Foundry', email: 'ap@pellby.example' });
    const res = await control(`customers/${customer.id}/subscriptions`, {
      price: 'price_desk_annual',
      'metadata[accountId]': 'acct_7',
    });
    expect(res.status).toBe(200);
    const { id } = (await res.json()) as { id: string };
    const sub = await h.stripe.subscriptions.retrieve(id);
    expect(sub).toMatchObject({ status: 'active', customer: customer.id, metadata: { accountId: 'acct_7' } });
    const item = sub.items.data[0]!;
    expect(item.price.id).toBe('price_desk_annual');
    // One yearly period from the start [cp: calendar billing, as mocks/stripe/periods.ts].
    const start = new Date(item.current_period_start * 1000);
    const end = new Date(item.current_period_end * 1000);
    expect(end.getUTCFullYear() - start.getUTCFullYear()).toBe(1);
    expect(end.getUTCMonth()).toBe(start.getUTCMonth());
    await waitUntil(() => h.receiver.events.length >= 2, 'the two events');
    expect(h.receiver.events.map((e) => e.type)).toEqual(['customer.subscription.created', 'invoice.paid']);
    expect((h.receiver.events[1]!.data.object as { status: string }).status).toBe('paid');
  });

  it('refuses an unknown customer (404) and an unknown price (400), creating nothing', async () => {
    const missing = await control('customers/cus_nobody/subscriptions', { price: 'price_desk_monthly' });
    expect(missing.status).toBe(404);
    const customer = await h.stripe.customers.create({ name: 'Pellby Foundry' });
    const badPrice = await control(`customers/${customer.id}/subscriptions`, { price: 'price_gold' });
    expect(badPrice.status).toBe(400);
    expect(((await badPrice.json()) as { error: { param: string } }).error.param).toBe('price');
    const health = (await (await fetch(`${h.fake.url}/_control/health`)).json()) as { subscriptions: number };
    expect(health.subscriptions).toBe(0);
  });

  it('reads a customer back, and answers 404 for one it does not hold', async () => {
    const customer = await h.stripe.customers.create({ name: 'Pellby Foundry' });
    expect((await h.stripe.customers.retrieve(customer.id)).id).toBe(customer.id);
    await expect(h.stripe.customers.retrieve('cus_gone')).rejects.toMatchObject({ statusCode: 404 });
  });
});

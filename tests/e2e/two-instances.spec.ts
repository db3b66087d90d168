import Stripe from 'stripe';
import { expect, test } from '@playwright/test';
import { e2eBaseUrl, e2ePorts, e2eSecondUrl } from './ports';
import { secretCanaries } from './support/canaries';
import { query } from './support/scenario';

// Two app instances share one database: the same payment event delivered to both is applied once.
test('a webhook delivered to two instances at once is processed exactly once', async ({ request }) => {
  const sdk = new Stripe('sk_test_two_instances', {
    host: '127.0.0.1',
    port: e2ePorts.stripe,
    protocol: 'http',
    maxNetworkRetries: 0,
  });
  const [acct] = await query<{ id: string }>("select id from accounts where name = 'Oakhollow Glassworks'");
  // A real subscription at the fake, bought by that account (its own webhooks reach instance one).
  const session = await sdk.checkout.sessions.create({
    mode: 'subscription',
    line_items: [{ price: 'price_desk_monthly', quantity: 1 }],
    customer_email: 'dev.hartigan@oakhollow.example',
    client_reference_id: acct!.id,
    metadata: { accountId: acct!.id },
    subscription_data: { metadata: { accountId: acct!.id } },
    success_url: `${e2eBaseUrl}/billing`,
    cancel_url: `${e2eBaseUrl}/billing`,
  });
  const pay = await request.post(session.url!, {
    form: {
      email: 'dev.hartigan@oakhollow.example',
      cardNumber: '4242 4242 4242 4242',
      expiry: '12/39',
      cvc: '123',
      name: 'Dev Hartigan',
    },
    maxRedirects: 0,
  });
  expect(pay.status()).toBe(303);
  const done = await sdk.checkout.sessions.retrieve(session.id);
  const subscription = await sdk.subscriptions.retrieve(String(done.subscription));
  // A fresh event id the app has never seen, signed as the service signs it.
  const event = {
    id: `evt_twin_${Date.now()}`,
    object: 'event',
    api_version: Stripe.API_VERSION,
    created: Math.floor(Date.now() / 1000),
    type: 'customer.subscription.updated',
    data: { object: subscription },
    livemode: false,
    pending_webhooks: 1,
  };
  const payload = JSON.stringify(event);
  const headers = {
    'stripe-signature': Stripe.webhooks.generateTestHeaderString({
      payload,
      secret: secretCanaries.STRIPE_WEBHOOK_SECRET,
    }),
    'content-type': 'application/json',
  };
  const [a, b] = await Promise.all([
    request.post(`${e2eBaseUrl}/api/webhooks/stripe`, { data: payload, headers }),
    request.post(`${e2eSecondUrl}/api/webhooks/stripe`, { data: payload, headers }),
  ]);
  expect([a.status(), b.status()]).toEqual([200, 200]);
  const outcomes = [(await a.json()).outcome, (await b.json()).outcome].sort();
  expect(outcomes).toEqual(['applied', 'duplicate']);
  const rows = await query<{ n: number }>('select count(*)::int as n from webhook_events where id = $1', [event.id]);
  expect(rows[0]!.n).toBe(1);
});

test('both instances report ready against the shared database', async ({ request }) => {
  for (const base of [e2eBaseUrl, e2eSecondUrl]) {
    const res = await request.get(`${base}/api/ready`);
    expect(res.status()).toBe(200);
    expect((await res.json()).ready).toBe(true);
  }
});

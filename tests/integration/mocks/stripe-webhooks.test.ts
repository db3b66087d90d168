import { createServer } from 'node:net';
import { afterEach, describe, expect, it } from 'vitest';
import {
  control,
  createDeskCheckout,
  type Harness,
  payHostedCheckout,
  startHarness,
  subscribe,
  SUCCESS_CARD,
  waitUntil,
} from './stripe-harness';

let h: Harness | undefined;
afterEach(async () => {
  await h?.close();
  h = undefined;
});

/** A port nothing listens on: bound, read, released. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

describe('webhook delivery', () => {
  it('retries after 500 responses and then delivers', async () => {
    // The first two attempts fail whatever event they carry; the retries then succeed.
    h = await startHarness({ respond: (attempt) => (attempt <= 2 ? 500 : 200) });
    const harness = h;
    const session = await createDeskCheckout(harness.stripe);
    await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    await waitUntil(
      () => harness.fake.events().every((e) => e.delivery.status === 'delivered'),
      'all events delivered',
    );
    expect(harness.receiver.deliveries.filter((d) => d.status === 500)).toHaveLength(2);
    expect(harness.receiver.events.map((e) => e.type).sort()).toEqual([
      'checkout.session.completed',
      'customer.subscription.created',
      'invoice.paid',
    ]);
    const attempts = harness.fake.events().map((e) => e.delivery.attempts);
    expect(attempts.reduce((a, b) => a + b, 0)).toBe(5);
    expect(harness.fake.events().every((e) => e.delivery.lastStatusCode === 200)).toBe(true);
  });

  it('gives up after the configured attempts and reports the failure', async () => {
    h = await startHarness({ respond: () => 503, retryDelaysMs: [5, 5] });
    const harness = h;
    await createDeskCheckout(harness.stripe).then((s) => payHostedCheckout(s.url ?? '', SUCCESS_CARD));
    expect(await harness.fake.webhooksIdle()).toBe(true);
    const listed = await control(harness.fake, 'events', 'GET');
    const data = listed.body.data as {
      type: string;
      delivery: { status: string; attempts: number; lastStatusCode: number };
    }[];
    expect(data).toHaveLength(3);
    for (const event of data)
      expect(event.delivery).toMatchObject({ status: 'failed', attempts: 3, lastStatusCode: 503 });
  });

  it('records connection errors when the app is not listening', async () => {
    h = await startHarness({ retryDelaysMs: [5] });
    await h.fake.close();
    await h.receiver.close();
    const port = await closedPort();
    h = await startHarness({ webhookUrl: `http://127.0.0.1:${port}/api/webhooks/stripe`, retryDelaysMs: [5] });
    const harness = h;
    await createDeskCheckout(harness.stripe).then((s) => payHostedCheckout(s.url ?? '', SUCCESS_CARD));
    expect(await harness.fake.webhooksIdle()).toBe(true);
    for (const event of harness.fake.events()) {
      expect(event.delivery.status).toBe('failed');
      expect(event.delivery.attempts).toBe(2);
      expect(event.delivery.lastStatusCode).toBeNull();
      expect(event.delivery.lastError).toMatch(/ECONNREFUSED/);
    }
  });

  it('resends a delivered event with the same id and a fresh valid signature', async () => {
    h = await startHarness();
    const harness = h;
    await subscribe(harness);
    const first = harness.fake.events()[1];
    expect(first?.type).toBe('checkout.session.completed');
    const resent = await control(harness.fake, `events/${first?.id}/resend`);
    expect(resent.status).toBe(200);
    await waitUntil(() => harness.receiver.events.filter((e) => e.id === first?.id).length === 2, 'the replayed event');
    const copies = harness.receiver.events.filter((e) => e.id === first?.id);
    expect(copies[1]?.data.object).toEqual(copies[0]?.data.object);
    expect(harness.receiver.deliveries.every((d) => d.verified)).toBe(true);
    expect((await control(harness.fake, 'events/evt_missing/resend')).status).toBe(404);
  });
});

describe('control endpoints', () => {
  it('reports health and resets all state', async () => {
    h = await startHarness();
    const harness = h;
    const { subscriptionId } = await subscribe(harness);
    const health = await control(harness.fake, 'health', 'GET');
    expect(health.body).toMatchObject({ ok: true, subscriptions: 1, events: 3 });
    expect((await control(harness.fake, 'reset')).status).toBe(200);
    expect(harness.fake.events()).toHaveLength(0);
    await expect(harness.stripe.subscriptions.retrieve(subscriptionId)).rejects.toMatchObject({ statusCode: 404 });
    expect((await control(harness.fake, 'subscriptions/sub_missing/fail-payment')).status).toBe(404);
  });
});

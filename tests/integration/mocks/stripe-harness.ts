import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { type StripeFakeHandle, type StripeFakeOptions, startStripeFake } from '@/mocks/stripe/server';

export const WEBHOOK_SECRET = 'whsec_harness_local';
// Stripe's documented test cards [pub: Stripe docs, "Testing"].
export const SUCCESS_CARD = '4242 4242 4242 4242';
export const DECLINE_CARD = '4000 0000 0000 0002';

export type Delivery = {
  attempt: number;
  status: number;
  eventId: string | null;
  eventType: string | null;
  verified: boolean;
};

/** Polls a condition; fails with `what` if it never holds (a wait, not a timing assertion). */
export async function waitUntil(condition: () => boolean, what: string, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!condition()) {
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 15));
  }
}

/**
 * A webhook endpoint like the app's: verifies each delivery with the real SDK and the shared
 * secret, and answers with the status `respond` picks for the n-th attempt.
 */
export async function startWebhookReceiver(respond: (attempt: number) => number = () => 200) {
  const verifier = new Stripe('sk_test_receiver', { apiVersion: Stripe.API_VERSION });
  const deliveries: Delivery[] = [];
  const events: Stripe.Event[] = [];
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      const body = Buffer.concat(chunks).toString('utf8');
      const signature = String(req.headers['stripe-signature'] ?? '');
      let event: Stripe.Event | null = null;
      try {
        event = verifier.webhooks.constructEvent(body, signature, WEBHOOK_SECRET);
      } catch {
        event = null;
      }
      const status = event ? respond(deliveries.length + 1) : 400;
      deliveries.push({
        attempt: deliveries.length + 1,
        status,
        eventId: event?.id ?? null,
        eventType: event?.type ?? null,
        verified: event !== null,
      });
      if (event && status >= 200 && status < 300) events.push(event);
      res.writeHead(status, { 'content-type': 'application/json' }).end('{}');
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const port = (server.address() as AddressInfo).port;
  return {
    url: `http://127.0.0.1:${port}/api/webhooks/stripe`,
    deliveries,
    /** Events accepted (verified and answered 2xx), in arrival order. */
    events,
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

export type Harness = {
  fake: StripeFakeHandle;
  stripe: Stripe;
  receiver: Awaited<ReturnType<typeof startWebhookReceiver>>;
  close(): Promise<void>;
};

/** A Stripe client pointed at the fake exactly the way the app points its own client. */
export function stripeClientFor(fake: StripeFakeHandle): Stripe {
  return new Stripe('sk_test_local', {
    host: '127.0.0.1',
    port: fake.port,
    protocol: 'http',
    maxNetworkRetries: 0,
    apiVersion: Stripe.API_VERSION,
  });
}

export async function startHarness(
  options: { respond?: (attempt: number) => number } & Partial<StripeFakeOptions> = {},
): Promise<Harness> {
  const { respond, ...fakeOptions } = options;
  const receiver = await startWebhookReceiver(respond);
  const fake = await startStripeFake({
    port: 0,
    webhookUrl: receiver.url,
    webhookSecret: WEBHOOK_SECRET,
    retryDelaysMs: [20, 40, 80],
    log: () => undefined,
    ...fakeOptions,
  });
  return {
    fake,
    stripe: stripeClientFor(fake),
    receiver,
    close: async () => {
      await fake.close();
      await receiver.close();
    },
  };
}

export function createDeskCheckout(
  stripe: Stripe,
  priceId = 'price_desk_monthly',
  extra: Partial<Stripe.Checkout.SessionCreateParams> = {},
) {
  return stripe.checkout.sessions.create({
    mode: 'subscription',
    line_items: [{ price: priceId, quantity: 1 }],
    customer_email: 'buyer@kestrel-thermal.example',
    client_reference_id: 'acct_7f3a',
    metadata: { accountId: 'acct_7f3a' },
    subscription_data: { metadata: { accountId: 'acct_7f3a', plan: priceId } },
    success_url: 'http://localhost:3000/billing/complete?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://localhost:3000/pricing',
    ...extra,
  });
}

/** Submits the hosted checkout form the way a browser would, without following the redirect. */
export function payHostedCheckout(pageUrl: string, card: string, overrides: Record<string, string> = {}) {
  const form = new URLSearchParams({
    email: 'buyer@kestrel-thermal.example',
    cardNumber: card,
    expiry: '12/39',
    cvc: '123',
    name: 'Ilse Marrow',
    ...overrides,
  });
  return fetch(pageUrl, { method: 'POST', body: form, redirect: 'manual' });
}

/** A paid monthly subscription with its three checkout events already accepted by the receiver. */
export async function subscribe(h: Harness, priceId = 'price_desk_monthly') {
  const session = await createDeskCheckout(h.stripe, priceId);
  const before = h.receiver.events.length;
  const response = await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
  if (response.status !== 303) throw new Error(`checkout did not complete: HTTP ${response.status}`);
  await waitUntil(() => h.receiver.events.length >= before + 3, 'the three checkout events');
  // The receiver sees an event before its 200 reaches the fake; wait for the fake's own record too.
  if (!(await h.fake.webhooksIdle())) throw new Error('webhook deliveries did not settle');
  const done = await h.stripe.checkout.sessions.retrieve(session.id);
  return { sessionId: session.id, subscriptionId: String(done.subscription), customerId: String(done.customer) };
}

export async function control(fake: StripeFakeHandle, path: string, method = 'POST') {
  const response = await fetch(`${fake.url}/_control/${path}`, { method });
  return { status: response.status, body: (await response.json()) as Record<string, unknown> };
}

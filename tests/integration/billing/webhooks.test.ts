import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { eq } from 'drizzle-orm';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

// Ports and secret are fixed before any app module reads configuration.
const cfg = vi.hoisted(() => {
  const port = 21000 + Math.floor(Math.random() * 20000);
  process.env.STRIPE_API_PORT = String(port);
  process.env.STRIPE_API_HOST = '127.0.0.1';
  process.env.STRIPE_WEBHOOK_SECRET = 'whsec_billing_test';
  return { port, secret: 'whsec_billing_test' };
});

import { db } from '@/db';
import { accounts, subscriptions, webhookEvents } from '@/db/schema';
import { POST } from '@/app/api/webhooks/stripe/route';
import { openBillingPortal, startCheckout } from '@/lib/billing/checkout';
import { getEntitlement } from '@/lib/billing/entitlements';
import { stripe } from '@/lib/billing/stripe-client';
import { startStripeFake, type StripeFakeHandle } from '@/mocks/stripe/server';
import { DECLINE_CARD, payHostedCheckout, SUCCESS_CARD, waitUntil } from '../mocks/stripe-harness';
import { makeAccount, makeUser } from '../helpers/fixtures';

let fake: StripeFakeHandle;
let receiver: Server;
const outcomes: { type: string; status: number }[] = [];

/** Forwards the fake's deliveries to the app's real route handler, as Next would. */
async function startForwarder(): Promise<string> {
  receiver = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', async () => {
      const body = Buffer.concat(chunks).toString('utf8');
      const type = (JSON.parse(body) as { type: string }).type;
      const response = await POST(
        new Request('http://localhost/api/webhooks/stripe', {
          method: 'POST',
          body,
          headers: { 'stripe-signature': String(req.headers['stripe-signature']) },
        }),
      );
      outcomes.push({ type, status: response.status });
      res.writeHead(response.status, { 'content-type': 'application/json' }).end(await response.text());
    });
  });
  await new Promise<void>((r) => receiver.listen(0, '127.0.0.1', r));
  return `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/api/webhooks/stripe`;
}

const sign = (payload: string) => Stripe.webhooks.generateTestHeaderString({ payload, secret: cfg.secret });
const postEvent = (payload: string, signature = sign(payload)) =>
  POST(
    new Request('http://localhost/api/webhooks/stripe', {
      method: 'POST',
      body: payload,
      headers: { 'stripe-signature': signature },
    }),
  );

async function subscribedCustomer() {
  const acct = await makeAccount('Subscriber');
  const customer = await makeUser('customer', acct.id);
  const { url } = await startCheckout(customer, 'monthly');
  const res = await payHostedCheckout(url, SUCCESS_CARD, { email: customer.email });
  expect(res.status).toBe(303);
  await waitUntil(() => outcomes.filter((o) => o.type === 'invoice.paid').length > 0, 'invoice.paid delivered');
  await fake.webhooksIdle();
  return { acct, customer, sessionUrl: url };
}

beforeAll(async () => {
  fake = await startStripeFake({
    port: cfg.port,
    webhookUrl: await startForwarder(),
    webhookSecret: cfg.secret,
    retryDelaysMs: [30, 60, 120],
    redirectWaitMs: 0,
    log: () => undefined,
  });
});
afterAll(async () => {
  await fake.close();
  await new Promise<void>((r) => receiver.close(() => r()));
});

describe('payment webhooks', () => {
  it('refuses a bad signature with 400 and records nothing', async () => {
    const payload = JSON.stringify({
      id: 'evt_forged_1',
      object: 'event',
      type: 'invoice.paid',
      created: 1,
      data: { object: {} },
    });
    const res = await postEvent(payload, 't=1,v1=deadbeef');
    expect(res.status).toBe(400);
    expect(await db.select().from(webhookEvents).where(eq(webhookEvents.id, 'evt_forged_1'))).toHaveLength(0);
  });

  it('checkout with the success card unlocks the account through the signed webhook', async () => {
    const { acct } = await subscribedCustomer();
    const ent = await getEntitlement(acct.id);
    expect(ent).toMatchObject({ unlocked: true, status: 'active', reason: 'active' });
    expect(ent.periodEnd).not.toBeNull();
  });

  it('the decline card leaves the account locked and sends nothing', async () => {
    const acct = await makeAccount('Declined');
    const customer = await makeUser('customer', acct.id);
    const { url } = await startCheckout(customer, 'monthly');
    const before = outcomes.length;
    const res = await payHostedCheckout(url, DECLINE_CARD);
    expect(res.status).toBe(402);
    expect(await res.text()).toMatch(/declined/i);
    expect(outcomes.length).toBe(before);
    expect((await getEntitlement(acct.id)).unlocked).toBe(false);
  });

  it('the same event delivered twice changes nothing the second time', async () => {
    const { acct } = await subscribedCustomer();
    const events = (await (await fetch(`${fake.url}/_control/events`)).json()) as {
      data: { id: string; type: string }[];
    };
    const paid = events.data.filter((e) => e.type === 'invoice.paid').at(-1)!;
    const [before] = await db.select().from(subscriptions).where(eq(subscriptions.accountId, acct.id));
    const n = outcomes.length;
    await fetch(`${fake.url}/_control/events/${paid.id}/resend`, { method: 'POST' });
    await waitUntil(() => outcomes.length > n, 'replayed delivery');
    const [after] = await db.select().from(subscriptions).where(eq(subscriptions.accountId, acct.id));
    expect(after).toEqual(before);
  });

  it('cancelling at period end keeps access until the period ends, then locks', async () => {
    const { acct, customer } = await subscribedCustomer();
    const [sub] = await db.select().from(subscriptions).where(eq(subscriptions.accountId, acct.id));
    const n = outcomes.length;
    // The customer cancels on the portal page the app sends them to.
    const portal = await openBillingPortal(customer);
    const cancelled = await fetch(`${portal.url}/subscriptions/${sub!.stripeSubscriptionId}/cancel`, {
      method: 'POST',
      redirect: 'manual',
    });
    expect(cancelled.status).toBeLessThan(400);
    await waitUntil(() => outcomes.length > n, 'subscription.updated delivered');
    await fake.webhooksIdle();
    expect(await getEntitlement(acct.id)).toMatchObject({ unlocked: true, cancelAtPeriodEnd: true });
    const m = outcomes.length;
    await fetch(`${fake.url}/_control/subscriptions/${sub!.stripeSubscriptionId}/advance-period-end`, {
      method: 'POST',
    });
    await waitUntil(() => outcomes.length > m, 'subscription.deleted delivered');
    await fake.webhooksIdle();
    const ent = await getEntitlement(acct.id);
    expect(ent.status).toBe('canceled');
    expect(ent.unlocked).toBe(false);
  });

  it('an update that arrives before its checkout completion still ends active', async () => {
    const { acct } = await subscribedCustomer();
    const list = (await (await fetch(`${fake.url}/_control/events`)).json()) as {
      data: { id: string; type: string }[];
    };
    // Replay this subscription's events newest first into a fresh account state.
    await db.delete(subscriptions).where(eq(subscriptions.accountId, acct.id));
    const mine = list.data.slice(-3).reverse();
    await db.delete(webhookEvents).where(eq(webhookEvents.id, mine[0]!.id));
    await db.delete(webhookEvents).where(eq(webhookEvents.id, mine[1]!.id));
    await db.delete(webhookEvents).where(eq(webhookEvents.id, mine[2]!.id));
    for (const e of mine) {
      const n = outcomes.length;
      await fetch(`${fake.url}/_control/events/${e.id}/resend`, { method: 'POST' });
      await waitUntil(() => outcomes.length > n, `replay of ${e.type}`);
    }
    expect(await getEntitlement(acct.id)).toMatchObject({ unlocked: true, status: 'active' });
  });

  it('a processing failure answers 5xx and a retry succeeds', async () => {
    // A checkout for an account the app does not have yet: processing fails, nothing is recorded, the sender retries.
    const futureAccountId = crypto.randomUUID();
    const sdk = new Stripe('sk_test_x', { host: '127.0.0.1', port: cfg.port, protocol: 'http', maxNetworkRetries: 0 });
    const session = await sdk.checkout.sessions.create({
      mode: 'subscription',
      line_items: [{ price: 'price_desk_annual', quantity: 1 }],
      customer_email: 'late@customer.example',
      client_reference_id: futureAccountId,
      metadata: { accountId: futureAccountId },
      subscription_data: { metadata: { accountId: futureAccountId } },
      success_url: 'http://localhost/billing',
      cancel_url: 'http://localhost/billing',
    });
    const n = outcomes.length;
    await payHostedCheckout(session.url!, SUCCESS_CARD);
    await waitUntil(() => outcomes.slice(n).some((o) => o.status === 500), 'a failed delivery');
    await fake.webhooksIdle(10_000);
    const failed = outcomes.slice(n).filter((o) => o.status === 500);
    expect(failed.length).toBeGreaterThan(0);
    const done = await sdk.checkout.sessions.retrieve(session.id);
    expect(
      await db
        .select()
        .from(subscriptions)
        .where(eq(subscriptions.stripeSubscriptionId, String(done.subscription))),
    ).toHaveLength(0);
    // The account appears; the sender's next attempt is processed.
    await db
      .insert(accounts)
      .values({ id: futureAccountId, name: 'Late account', billingContactEmail: 'late@customer.example' });
    const list = (await (await fetch(`${fake.url}/_control/events`)).json()) as {
      data: { id: string; type: string }[];
    };
    const created = list.data.filter((e) => e.type === 'customer.subscription.created').at(-1)!;
    const m = outcomes.length;
    await fetch(`${fake.url}/_control/events/${created.id}/resend`, { method: 'POST' });
    await waitUntil(() => outcomes.length > m, 'the retry');
    expect(outcomes.at(-1)!.status).toBe(200);
    expect((await getEntitlement(futureAccountId)).unlocked).toBe(true);
  });

  it('refuses a signed event that names an account its customer does not belong to, and changes nothing', async () => {
    const { acct } = await subscribedCustomer();
    const victim = await makeAccount('Not paying');
    const [sub] = await db.select().from(subscriptions).where(eq(subscriptions.accountId, acct.id));
    const payload = JSON.stringify({
      id: `evt_mismatch_${victim.id.slice(0, 8)}`,
      object: 'event',
      type: 'checkout.session.completed',
      created: Math.floor(Date.now() / 1000),
      data: {
        object: {
          id: 'cs_forged',
          object: 'checkout.session',
          client_reference_id: victim.id,
          customer: sub!.stripeCustomerId,
          subscription: sub!.stripeSubscriptionId,
        },
      },
    });
    const res = await postEvent(payload);
    expect(res.status).toBe(422);
    expect((await getEntitlement(victim.id)).unlocked).toBe(false);
    expect(await db.select().from(subscriptions).where(eq(subscriptions.accountId, victim.id))).toHaveLength(0);
    expect(
      await db
        .select()
        .from(webhookEvents)
        .where(eq(webhookEvents.id, JSON.parse(payload).id)),
    ).toHaveLength(0);
  });

  it('two events for one subscription applied at once leave the newest status, not an older one', async () => {
    const { acct } = await subscribedCustomer();
    const [sub] = await db.select().from(subscriptions).where(eq(subscriptions.accountId, acct.id));
    const subId = sub!.stripeSubscriptionId;
    // The first event's read of the subscription is slow: it sees "active", then takes 400 ms to return.
    const client = stripe();
    const original = client.subscriptions.retrieve.bind(client.subscriptions);
    let firstRead: () => void = () => undefined;
    const firstReadDone = new Promise<void>((r) => (firstRead = r));
    let calls = 0;
    const spy = vi.spyOn(client.subscriptions, 'retrieve').mockImplementation((async (id: string) => {
      const state = await original(id);
      if (++calls === 1) {
        firstRead();
        await new Promise((r) => setTimeout(r, 400));
      }
      return state;
    }) as typeof client.subscriptions.retrieve);
    try {
      const event = (n: number) =>
        JSON.stringify({
          id: `evt_race_${n}_${subId}`,
          object: 'event',
          type: 'customer.subscription.updated',
          created: Math.floor(Date.now() / 1000),
          data: { object: { id: subId, object: 'subscription' } },
        });
      const first = postEvent(event(1));
      await firstReadDone;
      // Meanwhile the subscription is cancelled and a second event about it arrives (and the fake's own).
      const ended = await fetch(`http://127.0.0.1:${cfg.port}/_control/subscriptions/${subId}/end`, { method: 'POST' });
      expect(ended.status).toBe(200);
      const second = postEvent(event(2));
      expect((await first).status).toBe(200);
      expect((await second).status).toBe(200);
      await fake.webhooksIdle();
    } finally {
      spy.mockRestore();
    }
    const [after] = await db.select().from(subscriptions).where(eq(subscriptions.stripeSubscriptionId, subId));
    expect(after!.status).toBe('canceled');
    expect((await getEntitlement(acct.id)).unlocked).toBe(false);
  });
});

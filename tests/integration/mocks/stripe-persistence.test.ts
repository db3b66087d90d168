import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { startStripeFake } from '@/mocks/stripe/server';
import {
  createDeskCheckout,
  payHostedCheckout,
  startHarness,
  startWebhookReceiver,
  stripeClientFor,
  subscribe,
  SUCCESS_CARD,
  WEBHOOK_SECRET,
  waitUntil,
} from './stripe-harness';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'dutywise-stripe-fake-'));
});
afterEach(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe('state file', () => {
  it('keeps subscriptions and events across a restart', async () => {
    const statePath = join(dir, 'stripe.json');
    const first = await startHarness({ statePath });
    const { subscriptionId, customerId } = await subscribe(first);
    const before = await first.stripe.subscriptions.retrieve(subscriptionId);
    await first.close();

    const again = await startStripeFake({
      port: 0,
      webhookUrl: 'http://127.0.0.1:9/unused',
      webhookSecret: WEBHOOK_SECRET,
      statePath,
      log: () => undefined,
    });
    try {
      const stripe = stripeClientFor(again);
      const after = await stripe.subscriptions.retrieve(subscriptionId);
      expect(after.status).toBe('active');
      expect(after.customer).toBe(customerId);
      expect(after.items.data[0]?.current_period_end).toBe(before.items.data[0]?.current_period_end);
      expect(again.events().map((e) => e.delivery.status)).toEqual(['delivered', 'delivered', 'delivered']);
    } finally {
      await again.close();
    }
  });

  it('resumes deliveries that were still pending when the fake stopped', async () => {
    const statePath = join(dir, 'stripe.json');
    // The app is "down": every attempt fails and the next retry is far away.
    const down = await startHarness({ statePath, respond: () => 503, retryDelaysMs: [600_000] });
    const session = await createDeskCheckout(down.stripe);
    await payHostedCheckout(session.url ?? '', SUCCESS_CARD);
    await waitUntil(() => down.fake.events().every((e) => e.delivery.attempts === 1), 'first attempts');
    expect(down.fake.events().map((e) => e.delivery.status)).toEqual(['pending', 'pending', 'pending']);
    await down.close();

    const up = await startWebhookReceiver();
    const again = await startStripeFake({
      port: 0,
      webhookUrl: up.url,
      webhookSecret: WEBHOOK_SECRET,
      statePath,
      log: () => undefined,
    });
    try {
      await waitUntil(() => again.events().every((e) => e.delivery.status === 'delivered'), 'the resumed deliveries');
      expect(up.events.map((e) => e.type).sort()).toEqual([
        'checkout.session.completed',
        'customer.subscription.created',
        'invoice.paid',
      ]);
      expect(again.events().every((e) => e.delivery.status === 'delivered' && e.delivery.attempts === 2)).toBe(true);
    } finally {
      await again.close();
      await up.close();
    }
  });

  it('refuses to start over an unreadable state file', async () => {
    const statePath = join(dir, 'broken.json');
    writeFileSync(statePath, '{ not json');
    await expect(
      startStripeFake({ port: 0, webhookUrl: 'http://127.0.0.1:9/', webhookSecret: WEBHOOK_SECRET, statePath }),
    ).rejects.toThrow(statePath);
  });

  it('refuses bad options with the field named', async () => {
    await expect(
      startStripeFake({ port: 70_000, webhookUrl: 'http://127.0.0.1:9/', webhookSecret: WEBHOOK_SECRET }),
    ).rejects.toThrow(/port/);
    await expect(startStripeFake({ port: 0, webhookUrl: 'not a url', webhookSecret: WEBHOOK_SECRET })).rejects.toThrow(
      /webhookUrl/,
    );
    await expect(startStripeFake({ port: 0, webhookUrl: 'http://127.0.0.1:9/', webhookSecret: '' })).rejects.toThrow(
      /webhookSecret/,
    );
  });
});

import { mkdtempSync, rmSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

// The payment client is pointed at this test's own fake before any app module reads configuration.
const cfg = vi.hoisted(() => {
  const port = 21000 + Math.floor(Math.random() * 20000);
  process.env.STRIPE_API_PORT = String(port);
  process.env.STRIPE_API_HOST = '127.0.0.1';
  return { port };
});

import { db } from '@/db';
import { accounts, subscriptions } from '@/db/schema';
import { type DemoBillingSpec, seedDemoBilling } from '@/db/demo-billing';
import { openBillingPortal } from '@/lib/billing/checkout';
import { getEntitlement } from '@/lib/billing/entitlements';
import { stripe } from '@/lib/billing/stripe-client';
import { startStripeFake, type StripeFakeHandle } from '@/mocks/stripe/server';
import { makeAccount, makeUser } from '../helpers/fixtures';

const dir = mkdtempSync(path.join(tmpdir(), 'demo-billing-'));
const statePath = path.join(dir, 'stripe-fake.json');
let fake: StripeFakeHandle;
let specs: DemoBillingSpec[];
let ids: { active: string; pastDue: string; never: string };

// Nothing listens on the webhook address: this test checks what the seed itself writes, not the webhook.
const startFake = () =>
  startStripeFake({
    port: cfg.port,
    webhookUrl: 'http://127.0.0.1:9/api/webhooks/stripe',
    webhookSecret: 'whsec_demo_billing',
    retryDelaysMs: [],
    statePath,
    log: () => undefined,
  });
/** Ends a subscription in the fake now, on a fresh connection (the fake was just restarted on the same port). */
const endNow = (id: string) =>
  new Promise<void>((resolve, reject) =>
    request(`${fake.url}/_control/subscriptions/${id}/end`, { method: 'POST', agent: false }, (res) =>
      res.resume().on('end', () => (res.statusCode === 200 ? resolve() : reject(new Error(`end: ${res.statusCode}`)))),
    )
      .on('error', reject)
      .end(),
  );
const run = () => seedDemoBilling(specs, { scope: Object.values(ids) });
const rowsOf = (accountId: string) => db.select().from(subscriptions).where(eq(subscriptions.accountId, accountId));
const linkOf = async (accountId: string) =>
  (await db.select({ c: accounts.stripeCustomerId }).from(accounts).where(eq(accounts.id, accountId)))[0]?.c ?? null;

beforeAll(async () => {
  fake = await startFake();
  ids = { active: (await makeAccount()).id, pastDue: (await makeAccount()).id, never: (await makeAccount()).id };
  specs = [
    { accountId: ids.active, state: 'active' },
    { accountId: ids.pastDue, state: 'past_due' },
    { accountId: ids.never, state: 'never' },
  ];
});
afterAll(async () => {
  await fake.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('demo subscriptions', () => {
  it('gives each account its state in the fake and in the database, the same subscription on both sides', async () => {
    const report = await run();
    expect(report).toMatchObject({ opened: 2, synced: 0, refailed: 0 });
    const active = await rowsOf(ids.active);
    expect(active).toHaveLength(1);
    const remote = await stripe().subscriptions.retrieve(active[0]!.stripeSubscriptionId);
    expect(remote.status).toBe('active');
    expect(remote.customer).toBe(await linkOf(ids.active));
    expect(await getEntitlement(ids.active)).toMatchObject({ unlocked: true, reason: 'active' });
    // The portal opens for the subscribed account's customer.
    const customer = await makeUser('customer', ids.active);
    const { url } = await openBillingPortal(customer);
    expect(await (await fetch(url)).text()).toContain(active[0]!.stripeSubscriptionId);

    const [due] = await rowsOf(ids.pastDue);
    expect((await stripe().subscriptions.retrieve(due!.stripeSubscriptionId)).status).toBe('past_due');
    const grace = await getEntitlement(ids.pastDue);
    expect(grace).toMatchObject({ unlocked: true, reason: 'grace', status: 'past_due' });
    // Grace runs BILLING_GRACE_DAYS (default 7) from the failure the seed just made.
    const days = (Date.parse(grace.graceEndsAt!) - due!.pastDueSince!.getTime()) / 86_400_000;
    expect(days).toBe(7);
    expect(Date.now() - due!.pastDueSince!.getTime()).toBeLessThan(120_000);

    expect(await rowsOf(ids.never)).toHaveLength(0);
    expect(await linkOf(ids.never)).toBeNull();
    expect(await getEntitlement(ids.never)).toMatchObject({ unlocked: false, reason: 'none' });
  });

  it('changes nothing on a restart with the saved fake state, keeping what a visitor did', async () => {
    const before = (await rowsOf(ids.active))[0]!.stripeSubscriptionId;
    await fake.close();
    fake = await startFake();
    // The subscription ended while the app was down (its event lost): the database catches up and nothing reopens.
    await endNow(before);
    const report = await run();
    expect(report).toMatchObject({ opened: 0, synced: 2, unlinked: 0, dropped: 0 });
    const rows = await rowsOf(ids.active);
    expect(rows.map((r) => r.stripeSubscriptionId)).toEqual([before]);
    expect(rows[0]!.status).toBe('canceled');
    // Put it back for the next cases: a fresh active subscription is what the demo starts with.
    await db.delete(subscriptions).where(eq(subscriptions.accountId, ids.active));
    expect((await run()).opened).toBe(1);
  });

  it('makes the states again when the fake lost its state file, dropping the links it no longer holds', async () => {
    const old = [(await rowsOf(ids.active))[0]!, (await rowsOf(ids.pastDue))[0]!];
    const oldCustomers = [await linkOf(ids.active), await linkOf(ids.pastDue)];
    await fake.close();
    rmSync(statePath);
    fake = await startFake();
    const report = await run();
    expect(report).toMatchObject({ unlinked: 2, opened: 2 });
    for (const [i, accountId] of [ids.active, ids.pastDue].entries()) {
      const rows = await rowsOf(accountId);
      expect(rows).toHaveLength(1);
      expect(rows[0]!.stripeSubscriptionId).not.toBe(old[i]!.stripeSubscriptionId);
      const link = await linkOf(accountId);
      expect(link).not.toBe(oldCustomers[i]);
      expect((await stripe().customers.retrieve(link!)).id).toBe(link);
    }
    expect(await getEntitlement(ids.pastDue)).toMatchObject({ reason: 'grace' });
  });

  it('fails the renewal again when the past-due account outlived its grace, so the demo shows it within grace', async () => {
    await db
      .update(subscriptions)
      .set({ pastDueSince: sql`now() - interval '8 days'` })
      .where(eq(subscriptions.accountId, ids.pastDue));
    expect(await getEntitlement(ids.pastDue)).toMatchObject({ unlocked: false, reason: 'lapsed' });
    expect((await run()).refailed).toBe(1);
    const [row] = await rowsOf(ids.pastDue);
    expect(Date.now() - row!.pastDueSince!.getTime()).toBeLessThan(120_000);
    expect(await getEntitlement(ids.pastDue)).toMatchObject({ unlocked: true, reason: 'grace' });
    expect((await stripe().subscriptions.retrieve(row!.stripeSubscriptionId)).status).toBe('past_due');
  });
});

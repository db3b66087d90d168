// The local Stripe fake's demo controls (mocks/stripe, /_control/), reached over HTTP like the rest of the fake.
// The hosted service has no such calls, so everything here refuses to run against anything but this machine.
import { request } from 'node:http';
import { env } from '@/lib/env';

const LOOPBACK = new Set(['127.0.0.1', 'localhost', '::1', '[::1]']);

/** The fake's base URL; throws unless the payment client points at this machine (the local fake). */
export function localFakeUrl(): string {
  if (!LOOPBACK.has(env.STRIPE_API_HOST))
    throw new Error(
      `demo subscriptions are seeded only into the local Stripe fake, but STRIPE_API_HOST is '${env.STRIPE_API_HOST}'`,
    );
  return `${env.STRIPE_API_PROTOCOL}://${env.STRIPE_API_HOST}:${env.STRIPE_API_PORT}`;
}

/** POSTs a form to a control; a fresh connection each time, so a restarted fake is never reached on a stale socket. */
function control(path: string, form: Record<string, string> = {}): Promise<unknown> {
  const body = new URLSearchParams(form).toString();
  return new Promise((resolve, reject) => {
    const req = request(
      `${localFakeUrl()}/_control/${path}`,
      { method: 'POST', agent: false, headers: { 'content-type': 'application/x-www-form-urlencoded' } },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => {
          const text = Buffer.concat(chunks).toString('utf8');
          if ((res.statusCode ?? 500) >= 400)
            return reject(new Error(`Stripe fake /_control/${path} answered ${res.statusCode}: ${text.slice(0, 300)}`));
          try {
            resolve(JSON.parse(text));
          } catch {
            reject(
              new Error(`Stripe fake /_control/${path} answered something other than JSON: ${text.slice(0, 300)}`),
            );
          }
        });
      },
    );
    req.on('error', reject);
    req.end(body);
  });
}

/** An active subscription with a paid first invoice for an existing customer; returns its id. */
export async function openFakeSubscription(customerId: string, priceId: string, accountId: string): Promise<string> {
  const sub = (await control(`customers/${encodeURIComponent(customerId)}/subscriptions`, {
    price: priceId,
    'metadata[accountId]': accountId,
  })) as { id: string };
  return sub.id;
}

/** A renewal charge that fails: the subscription goes past due and the fake sends invoice.payment_failed. */
export async function failFakeRenewal(subscriptionId: string): Promise<void> {
  await control(`subscriptions/${encodeURIComponent(subscriptionId)}/fail-payment`);
}

/** The period ends and renews with a paid invoice (a past-due subscription recovers). */
export async function renewFakeSubscription(subscriptionId: string): Promise<void> {
  await control(`subscriptions/${encodeURIComponent(subscriptionId)}/advance-period-end`);
}

/** Empties the fake: customers, subscriptions, events. */
export async function resetFake(): Promise<void> {
  await control('reset');
}

import 'server-only';
import Stripe from 'stripe';
import { env } from '@/lib/env';

// Pinned so a library upgrade never silently changes the shape of events we store.
export const STRIPE_API_VERSION = '2026-10-28.endive' as const;

let client: Stripe | undefined;

/** The one Stripe client: production talks to Stripe, the demo and tests to mocks/stripe, through the same SDK. */
export function stripe(): Stripe {
  client ??= new Stripe(env.STRIPE_SECRET_KEY, {
    apiVersion: STRIPE_API_VERSION,
    host: env.STRIPE_API_HOST,
    port: env.STRIPE_API_PORT,
    protocol: env.STRIPE_API_PROTOCOL,
    maxNetworkRetries: env.STRIPE_API_HOST === '127.0.0.1' || env.STRIPE_API_HOST === 'localhost' ? 0 : 2,
    timeout: 10_000,
    appInfo: { name: 'dutywise' },
  });
  return client;
}

export function priceIdFor(plan: 'monthly' | 'annual'): string {
  return plan === 'monthly' ? env.STRIPE_PRICE_MONTHLY : env.STRIPE_PRICE_ANNUAL;
}

/** True for failures to reach the payment service at all (as opposed to a refused request). */
export function isUnreachable(err: unknown): boolean {
  return (
    err instanceof Stripe.errors.StripeConnectionError ||
    (err instanceof Stripe.errors.StripeAPIError && (err.statusCode ?? 500) >= 500)
  );
}

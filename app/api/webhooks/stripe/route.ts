import type Stripe from 'stripe';
import { stripe } from '@/lib/billing/stripe-client';
import { applyStripeEvent, isHandled } from '@/lib/billing/webhook';
import { env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { unavailableJson } from '@/lib/ops/unavailable';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_BODY = 512 * 1024;

/** Payment events: raw body, verified signature, allow-listed types, 5xx on failure so the sender retries. */
export async function POST(req: Request) {
  const signature = req.headers.get('stripe-signature');
  const body = await req.text();
  if (!signature) return Response.json({ error: 'missing Stripe-Signature header' }, { status: 400 });
  if (Buffer.byteLength(body) > MAX_BODY) return Response.json({ error: 'payload too large' }, { status: 413 });
  let event: Stripe.Event;
  try {
    event = stripe().webhooks.constructEvent(body, signature, env.STRIPE_WEBHOOK_SECRET);
  } catch {
    return Response.json({ error: 'signature verification failed' }, { status: 400 });
  }
  if (!isHandled(event.type)) return Response.json({ received: true, ignored: event.type });
  try {
    const outcome = await applyStripeEvent(event);
    logger.info({ eventId: event.id, type: event.type, outcome }, 'payment event');
    return Response.json({ received: true, outcome });
  } catch (err) {
    if (isDatabaseDown(err)) {
      logger.warn({ eventId: event.id, type: event.type }, 'database unreachable; the sender will retry');
      return unavailableJson();
    }
    logger.error({ err, eventId: event.id, type: event.type }, 'payment event failed; the sender will retry');
    return Response.json({ error: 'processing failed; retry later' }, { status: 500 });
  }
}

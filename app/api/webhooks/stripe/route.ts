import type Stripe from 'stripe';
import { stripe } from '@/lib/billing/stripe-client';
import { applyStripeEvent, isHandled } from '@/lib/billing/webhook';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { logger } from '@/lib/log/logger';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_BODY = 512 * 1024;

function verifiedEvent(body: string, signature: string): Stripe.Event {
  try {
    return stripe().webhooks.constructEvent(body, signature, env.STRIPE_WEBHOOK_SECRET);
  } catch {
    throw new AppError('invalid_input', 'The signature does not match the payload.');
  }
}

/** Payment events: raw body, verified signature, allow-listed types, 5xx on failure so the sender retries. */
export const POST = defineHandler(
  async (req) => {
    const signature = req.headers.get('stripe-signature');
    const body = await req.text();
    if (!signature) throw new AppError('invalid_input', 'The Stripe-Signature header is missing.');
    if (Buffer.byteLength(body) > MAX_BODY) throw new AppError('too_large', 'The event payload is too large.');
    const event = verifiedEvent(body, signature);
    if (!isHandled(event.type)) return Response.json({ received: true, ignored: event.type });
    try {
      const outcome = await applyStripeEvent(event);
      logger.info({ eventId: event.id, type: event.type, outcome }, 'payment event');
      return Response.json({ received: true, outcome });
    } catch (err) {
      logger.error({ err, eventId: event.id, type: event.type }, 'payment event failed; the sender will retry');
      throw new AppError('internal', 'Processing failed; retry later.');
    }
  },
  { name: 'billing.receive_event' },
);

import type Stripe from 'stripe';
import { stripe } from '@/lib/billing/stripe-client';
import { AccountMismatchError } from '@/lib/billing/subscription-sync';
import { applyStripeEvent, isHandled } from '@/lib/billing/webhook';
import { env } from '@/lib/env';
import { readBodyLimited } from '@/lib/http/read-limited';
import { logger } from '@/lib/log/logger';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_BODY = 512 * 1024;

/** Payment events: raw body, verified signature, allow-listed types, 5xx on failure so the sender retries. */
export async function POST(req: Request) {
  const signature = req.headers.get('stripe-signature');
  if (!signature) return Response.json({ error: 'missing Stripe-Signature header' }, { status: 400 });
  // Bounded while it is read, before any signature work: an unsigned flood costs at most MAX_BODY each.
  const read = await readBodyLimited(req, MAX_BODY);
  if (!read.ok)
    return read.reason === 'too-large'
      ? Response.json({ error: 'payload too large' }, { status: 413 })
      : Response.json({ error: 'body could not be read' }, { status: 400 });
  const body = Buffer.from(read.bytes).toString('utf8');
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
    if (err instanceof AccountMismatchError) {
      // Signed, but naming an account its customer does not belong to: refused, and retrying cannot change that.
      logger.error({ err: err.message, eventId: event.id, type: event.type }, 'payment event refused');
      return Response.json(
        { error: 'event refused: it names an account its customer does not belong to' },
        { status: 422 },
      );
    }
    logger.error({ err, eventId: event.id, type: event.type }, 'payment event failed; the sender will retry');
    return Response.json({ error: 'processing failed; retry later' }, { status: 500 });
  }
}

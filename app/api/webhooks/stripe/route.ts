import type Stripe from 'stripe';
import { stripe } from '@/lib/billing/stripe-client';
import { AccountMismatchError } from '@/lib/billing/subscription-sync';
import { applyStripeEvent, isHandled } from '@/lib/billing/webhook';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { readBodyLimited } from '@/lib/http/read-limited';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';

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
    if (!signature) throw new AppError('invalid_input', 'The Stripe-Signature header is missing.');
    // Bounded while it is read, before any signature work: an unsigned flood costs at most MAX_BODY each.
    const read = await readBodyLimited(req, MAX_BODY);
    if (!read.ok)
      throw read.reason === 'too-large'
        ? new AppError('too_large', 'The event payload is too large.')
        : new AppError('invalid_input', 'The event payload could not be read completely.');
    const event = verifiedEvent(Buffer.from(read.bytes).toString('utf8'), signature);
    if (!isHandled(event.type)) return Response.json({ received: true, ignored: event.type });
    try {
      const outcome = await applyStripeEvent(event);
      logger.info({ eventId: event.id, type: event.type, outcome }, 'payment event');
      return Response.json({ received: true, outcome });
    } catch (err) {
      // The database gone: defineHandler answers 503 and the sender retries later.
      if (isDatabaseDown(err)) throw err;
      if (err instanceof AccountMismatchError) {
        // Signed, but naming an account its customer does not belong to: refused, and retrying cannot change that.
        logger.error({ err: err.message, eventId: event.id, type: event.type }, 'payment event refused');
        throw new AppError('unprocessable', 'Event refused: it names an account its customer does not belong to.');
      }
      logger.error({ err, eventId: event.id, type: event.type }, 'payment event failed; the sender will retry');
      throw new AppError('internal', 'Processing failed; retry later.');
    }
  },
  { name: 'billing.receive_event' },
);

import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { accounts } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { logger } from '@/lib/log/logger';
import type { PlanKey } from './plans';
import { isUnreachable, priceIdFor, stripe } from './stripe-client';

const unavailable = () =>
  new AppError(
    'unavailable',
    'Payments are unavailable right now; nothing was charged. Please try again in a few minutes.',
  );

async function accountOf(user: CurrentUser) {
  if (!user.accountId) throw new AppError('forbidden', 'Only a customer account can subscribe.');
  const [acct] = await db
    .select({
      id: accounts.id,
      name: accounts.name,
      email: accounts.billingContactEmail,
      stripeCustomerId: accounts.stripeCustomerId,
    })
    .from(accounts)
    .where(eq(accounts.id, user.accountId))
    .limit(1);
  if (!acct) throw new AppError('not_found', 'Your customer account no longer exists.');
  return acct;
}

/** The account's payment-service customer id, created on first checkout and stored only once it exists. */
async function ensureCustomer(user: CurrentUser, acct: Awaited<ReturnType<typeof accountOf>>): Promise<string> {
  if (acct.stripeCustomerId) return acct.stripeCustomerId;
  const customer = await stripe().customers.create(
    { name: acct.name, email: acct.email ?? user.email, metadata: { accountId: acct.id } },
    { idempotencyKey: `customer-${acct.id}` },
  );
  await db.transaction(async (tx) => {
    await tx.update(accounts).set({ stripeCustomerId: customer.id }).where(eq(accounts.id, acct.id));
    await writeAudit(tx, {
      actor: user,
      action: 'billing.customer_created',
      entityType: 'account',
      entityId: acct.id,
      accountId: acct.id,
      detail: { customer: customer.id },
    });
  });
  return customer.id;
}

/** Creates a subscription Checkout Session for the user's account and returns where to send the browser. */
export async function startCheckout(user: CurrentUser, plan: PlanKey): Promise<{ url: string }> {
  const acct = await accountOf(user);
  try {
    const customer = await ensureCustomer(user, acct);
    const session = await stripe().checkout.sessions.create({
      mode: 'subscription',
      customer,
      line_items: [{ price: priceIdFor(plan), quantity: 1 }],
      client_reference_id: acct.id,
      metadata: { accountId: acct.id, plan },
      subscription_data: { metadata: { accountId: acct.id, plan } },
      success_url: `${env.APP_URL}/billing?checkout=success&session_id={CHECKOUT_SESSION_ID}`,
      cancel_url: `${env.APP_URL}/billing?checkout=cancelled`,
    });
    if (!session.url) throw unavailable();
    return { url: session.url };
  } catch (err) {
    if (err instanceof AppError) throw err;
    logger.warn({ err: (err as Error).message, accountId: acct.id }, 'checkout could not be created');
    if (isUnreachable(err)) throw unavailable();
    throw new AppError(
      'upstream_failed',
      'The payment service refused the request; nothing was charged. Contact support if this persists.',
    );
  }
}

/** A customer-portal session for changing or cancelling the subscription. */
export async function openBillingPortal(user: CurrentUser): Promise<{ url: string }> {
  const acct = await accountOf(user);
  if (!acct.stripeCustomerId) throw new AppError('conflict', 'There is no subscription to manage yet.');
  try {
    const portal = await stripe().billingPortal.sessions.create({
      customer: acct.stripeCustomerId,
      return_url: `${env.APP_URL}/billing`,
    });
    return { url: portal.url };
  } catch (err) {
    logger.warn({ err: (err as Error).message, accountId: acct.id }, 'portal session failed');
    throw unavailable();
  }
}

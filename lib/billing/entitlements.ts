import 'server-only';
import { desc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { subscriptions } from '@/db/schema';
import { AppError } from '@/lib/errors';
import type { CurrentUser } from '@/lib/auth/current-user';
import { env } from '@/lib/env';

export type Entitlement = {
  unlocked: boolean;
  status: string | null;
  reason: 'active' | 'grace' | 'period-remaining' | 'none' | 'lapsed';
  periodEnd: string | null;
  cancelAtPeriodEnd: boolean;
  graceEndsAt: string | null;
};

type SubscriptionState = {
  status: string;
  currentPeriodEnd: Date | null;
  cancelAtPeriodEnd: boolean;
  pastDueSince: Date | null;
};

/**
 * Entitlement from stored status and period end: active or trialing unlocks; past due keeps access for
 * BILLING_GRACE_DAYS from the first failed payment; a cancellation at period end keeps access until that
 * period ends; a cancelled (ended) subscription unlocks nothing.
 */
export function entitlementFrom(
  sub: SubscriptionState | null,
  now = new Date(),
  graceDays = env.BILLING_GRACE_DAYS,
): Entitlement {
  const base = {
    status: sub?.status ?? null,
    periodEnd: sub?.currentPeriodEnd?.toISOString() ?? null,
    cancelAtPeriodEnd: sub?.cancelAtPeriodEnd ?? false,
    graceEndsAt: null,
  };
  if (!sub) return { ...base, unlocked: false, reason: 'none' };
  // A cancellation takes effect at period end even if the final event has not arrived yet.
  const periodOver = sub.currentPeriodEnd !== null && sub.currentPeriodEnd <= now;
  if ((sub.status === 'active' || sub.status === 'trialing') && sub.cancelAtPeriodEnd && periodOver)
    return { ...base, unlocked: false, reason: 'lapsed' };
  if (sub.status === 'active' || sub.status === 'trialing')
    return { ...base, unlocked: true, reason: sub.cancelAtPeriodEnd ? 'period-remaining' : 'active' };
  if (sub.status === 'past_due') {
    const since = sub.pastDueSince ?? now;
    const graceEnd = new Date(since.getTime() + graceDays * 86_400_000);
    return {
      ...base,
      unlocked: now < graceEnd,
      reason: now < graceEnd ? 'grace' : 'lapsed',
      graceEndsAt: graceEnd.toISOString(),
    };
  }
  return { ...base, unlocked: false, reason: 'lapsed' };
}

/** The account's current entitlement, from its most recently updated subscription. */
export async function getEntitlement(accountId: string): Promise<Entitlement> {
  const [sub] = await db
    .select({
      status: subscriptions.status,
      currentPeriodEnd: subscriptions.currentPeriodEnd,
      cancelAtPeriodEnd: subscriptions.cancelAtPeriodEnd,
      pastDueSince: subscriptions.pastDueSince,
    })
    .from(subscriptions)
    .where(eq(subscriptions.accountId, accountId))
    .orderBy(desc(subscriptions.updatedAt))
    .limit(1);
  return entitlementFrom(sub ?? null);
}

/**
 * What the plans page sells, enforced: a customer saves sizings to the account, uploads batches and downloads
 * datasheets only while the account is entitled. Vendor staff work on any account regardless. Throws a 402.
 */
export async function assertSubscribed(user: CurrentUser, what: string): Promise<void> {
  if (user.role !== 'customer') return;
  if (user.accountId && (await getEntitlement(user.accountId)).unlocked) return;
  throw new AppError(
    'payment_required',
    `${what} needs an active subscription for your account. Subscribe on the billing page (/billing).`,
  );
}

import 'server-only';
import { sql } from 'drizzle-orm';
import { entitlementFrom } from '@/lib/billing/entitlements';
import type { SubscriptionState } from '@/lib/billing/labels';

// The counts and subscription state of an account, read by one set of subqueries for the accounts list and an
// account's own page, so the two always agree. The outer query's table is named in full ("accounts".id): a
// bare column in a correlated subquery would bind to the subquery's own table.

type StoredSubscription = {
  status: string;
  currentPeriodEnd: string | null;
  cancelAtPeriodEnd: boolean;
  pastDueSince: string | null;
} | null;

/** The figures as a customer or as staff sees them: a customer counts only the quotes it can open (sent ones). */
export const accountFigureColumns = (staff: boolean) => ({
  memberCount: sql<number>`(select count(*)::int from memberships m where m.account_id = "accounts"."id")`,
  quoteCount: staff
    ? sql<number>`(select count(*)::int from quotes q where q.account_id = "accounts"."id")`
    : sql<number>`(select count(*)::int from quotes q where q.account_id = "accounts"."id" and q.status <> 'draft')`,
  sizingCount: sql<number>`(select count(*)::int from sizings z where z.account_id = "accounts"."id")`,
  subscription: sql<StoredSubscription>`(select json_build_object('status', s.status,
      'currentPeriodEnd', s.current_period_end, 'cancelAtPeriodEnd', s.cancel_at_period_end,
      'pastDueSince', s.past_due_since)
    from subscriptions s where s.account_id = "accounts"."id" order by s.updated_at desc limit 1)`,
});

const date = (v: string | null) => (v ? new Date(v) : null);

/** The subscription state in Dutywise's terms, from the same rule that unlocks datasheets. */
export function subscriptionStateOf(sub: StoredSubscription, now = new Date()): SubscriptionState {
  if (!sub) return 'none';
  return entitlementFrom(
    {
      status: sub.status,
      currentPeriodEnd: date(sub.currentPeriodEnd),
      cancelAtPeriodEnd: sub.cancelAtPeriodEnd,
      pastDueSince: date(sub.pastDueSince),
    },
    now,
  ).reason;
}

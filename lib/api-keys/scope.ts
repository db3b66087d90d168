import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { apiKeys } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { isStaff } from '@/lib/auth/roles';

/** The keys a user manages: a customer's account's keys, or a staff member's own. */
export function keyScope(user: CurrentUser) {
  if (isStaff(user.role)) return and(eq(apiKeys.ownerUserId, user.id), isNull(apiKeys.accountId));
  // A customer without an account has no keys: an impossible id keeps the filter in place.
  return eq(apiKeys.accountId, user.accountId ?? '00000000-0000-0000-0000-000000000000');
}

/** Today in UTC, the day usage is counted under. */
export const utcToday = sql`(now() at time zone 'utc')::date`;

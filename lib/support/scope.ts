import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import type { CurrentUser } from '@/lib/auth/current-user';

/**
 * Which sizings a look-up may return beyond the account scope. Support and admins look across every account;
 * a sales engineer looks across their own customers: accounts they created, sized for or quoted for.
 */
export function lookupScope(user: CurrentUser): SQL | null {
  if (user.role !== 'sales_engineer') return null;
  return sql`s.account_id in (
    select a.id from accounts a where a.created_by_user_id = ${user.id}
    union select z.account_id from sizings z where z.created_by_user_id = ${user.id}
    union select q.account_id from quotes q where q.created_by_user_id = ${user.id})`;
}

import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { memberships, users } from '@/db/schema';
import type { UserRole } from './roles';

// The user record as the app sees it, read by the request's current user and by the Clerk mapping alike, so
// neither of those modules imports the other.

/** The signed-in person as the rest of the app sees them, whichever identity provider is active. */
export type CurrentUser = {
  id: string;
  email: string;
  name: string;
  role: UserRole;
  accountId: string | null;
  unitSystem: 'si' | 'us';
};

/** Loads a Dutywise user with their account, or null when disabled or unknown. */
export async function loadUser(where: { id: string } | { clerkUserId: string }): Promise<CurrentUser | null> {
  const cond = 'id' in where ? eq(users.id, where.id) : eq(users.clerkUserId, where.clerkUserId);
  const rows = await db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: users.role,
      unitSystem: users.unitSystem,
      disabledAt: users.disabledAt,
      accountId: memberships.accountId,
    })
    .from(users)
    .leftJoin(memberships, eq(memberships.userId, users.id))
    .where(cond)
    .limit(1);
  const row = rows[0];
  if (!row || row.disabledAt) return null;
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    unitSystem: row.unitSystem,
    accountId: row.accountId ?? null,
  };
}

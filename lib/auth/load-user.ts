import 'server-only';
import { and, eq, gt, isNotNull, isNull } from 'drizzle-orm';
import { db } from '@/db';
import { memberships, users, userSessions } from '@/db/schema';
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

type Lookup = { id: string } | { clerkUserId: string } | { id: string; sessionId: string };

/**
 * Loads a Dutywise user with their account, or null when disabled, unknown or not yet verified. With a session id
 * the session row must also exist and be unexpired: signing out, a password change and disabling end it at once.
 */
export async function loadUser(where: Lookup): Promise<CurrentUser | null> {
  const base = 'clerkUserId' in where ? eq(users.clerkUserId, where.clerkUserId) : eq(users.id, where.id);
  const query = db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: users.role,
      unitSystem: users.unitSystem,
      accountId: memberships.accountId,
    })
    .from(users)
    .leftJoin(memberships, eq(memberships.userId, users.id));
  const open = and(base, isNull(users.disabledAt), isNotNull(users.emailVerifiedAt));
  const rows =
    'sessionId' in where
      ? await query
          .innerJoin(userSessions, eq(userSessions.userId, users.id))
          .where(and(open, eq(userSessions.id, where.sessionId), gt(userSessions.expiresAt, new Date())))
          .limit(1)
      : await query.where(open).limit(1);
  const row = rows[0];
  if (!row) return null;
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    unitSystem: row.unitSystem,
    accountId: row.accountId ?? null,
  };
}

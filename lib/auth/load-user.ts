import 'server-only';
import { and, eq, gt, inArray, isNotNull, isNull } from 'drizzle-orm';
import { db } from '@/db';
import { groupWhileBusy } from '@/db/grouped';
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

const columns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  unitSystem: users.unitSystem,
  accountId: memberships.accountId,
};
/** The row as the app sees it (a session read also carries the session's id, which is left behind). */
function asUser(row: CurrentUser | undefined): CurrentUser | null {
  if (!row) return null;
  const { id, email, name, role, unitSystem, accountId } = row;
  return { id, email, name, role, unitSystem, accountId: accountId ?? null };
}

const open = and(isNull(users.disabledAt), isNotNull(users.emailVerifiedAt));

// Every signed-in request reads its session: the reads made while one is on its way go together in one
// statement (db/grouped.ts), each answered with its own row.
const sessionUsers = groupWhileBusy(async (lookups: { id: string; sessionId: string }[]) => {
  const rows = await db
    .select({ ...columns, sessionId: userSessions.id })
    .from(users)
    .leftJoin(memberships, eq(memberships.userId, users.id))
    .innerJoin(userSessions, eq(userSessions.userId, users.id))
    .where(
      and(
        open,
        inArray(
          userSessions.id,
          lookups.map((l) => l.sessionId),
        ),
        gt(userSessions.expiresAt, new Date()),
      ),
    );
  return lookups.map((l) => asUser(rows.find((r) => r.sessionId === l.sessionId && r.id === l.id)));
});

/**
 * Loads a Dutywise user with their account, or null when disabled, unknown or not yet verified. With a session id
 * the session row must also exist and be unexpired: signing out, a password change and disabling end it at once.
 */
export async function loadUser(where: Lookup): Promise<CurrentUser | null> {
  if ('sessionId' in where) return sessionUsers(where);
  const base = 'clerkUserId' in where ? eq(users.clerkUserId, where.clerkUserId) : eq(users.id, where.id);
  const rows = await db
    .select(columns)
    .from(users)
    .leftJoin(memberships, eq(memberships.userId, users.id))
    .where(and(base, open))
    .limit(1);
  return asUser(rows[0]);
}

import 'server-only';
import { eq } from 'drizzle-orm';
import { cookies } from 'next/headers';
import { cache } from 'react';
import { db } from '@/db';
import { memberships, users } from '@/db/schema';
import { LOCAL_SESSION_COOKIE, verifyLocalSession } from '@/lib/auth/local/session-token';
import { clerkEnabled, env } from '@/lib/env';
import type { UserRole } from './roles';

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

async function localUser(): Promise<CurrentUser | null> {
  const store = await cookies();
  const claims = await verifyLocalSession(store.get(LOCAL_SESSION_COOKIE)?.value, env.SESSION_SECRET);
  if (!claims) return null;
  return loadUser({ id: claims.sub });
}

async function clerkUser(): Promise<CurrentUser | null> {
  const { resolveClerkUser } = await import('./clerk-user');
  return resolveClerkUser();
}

/** The current user for this request (memoised per request), or null when signed out. */
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  return clerkEnabled ? clerkUser() : localUser();
});

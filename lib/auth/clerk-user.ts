import 'server-only';
import { auth, clerkClient } from '@clerk/nextjs/server';
import { and, eq, isNull } from 'drizzle-orm';
import { db } from '@/db';
import { users } from '@/db/schema';
import { userRoles, type UserRole } from '@/db/schema/enums';
import { writeAudit } from '@/lib/audit/write';
import { loadUser, type CurrentUser } from './load-user';

/** Role from Clerk public metadata; anything unknown becomes a customer (least privilege). */
export function roleFromMetadata(meta: unknown): UserRole {
  const role = (meta as { role?: unknown } | null)?.role;
  return typeof role === 'string' && (userRoles as readonly string[]).includes(role) ? (role as UserRole) : 'customer';
}

/** Maps the verified Clerk session to a Dutywise user, creating the row on first sign-in. */
export async function resolveClerkUser(): Promise<CurrentUser | null> {
  const { userId } = await auth();
  return userId ? mapClerkUser(userId) : null;
}

/**
 * The Dutywise user for a Clerk user id; the first time (and while the address is unverified) the profile is read
 * from Clerk's backend API. Only an address Clerk reports verified makes the user active.
 */
export async function mapClerkUser(userId: string): Promise<CurrentUser | null> {
  const existing = await loadUser({ clerkUserId: userId });
  if (existing) return existing;
  const client = await clerkClient();
  const remote = await client.users.getUser(userId);
  const primary = remote.primaryEmailAddress ?? remote.emailAddresses[0];
  const email = primary?.emailAddress;
  if (!email) return null;
  const verifiedAt = primary?.verification?.status === 'verified' ? new Date() : null;
  const name = [remote.firstName, remote.lastName].filter(Boolean).join(' ') || email;
  const role = roleFromMetadata(remote.publicMetadata);
  await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(users)
      .values({ email, name, role, clerkUserId: userId, emailVerifiedAt: verifiedAt })
      .onConflictDoNothing()
      .returning({ id: users.id });
    if (row)
      await writeAudit(tx, {
        actor: { id: row.id, role },
        action: 'user.created',
        entityType: 'user',
        entityId: row.id,
        detail: { via: 'clerk-first-sign-in' },
      });
    else if (verifiedAt)
      await tx
        .update(users)
        .set({ emailVerifiedAt: verifiedAt })
        .where(and(eq(users.clerkUserId, userId), isNull(users.emailVerifiedAt)));
  });
  return loadUser({ clerkUserId: userId });
}

import { randomUUID } from 'node:crypto';
import { db } from '@/db';
import { accounts, memberships, users } from '@/db/schema';
import type { UserRole } from '@/db/schema/enums';
import type { CurrentUser } from '@/lib/auth/current-user';

// Test data is unique per call, so test files can share one database and run in parallel.
export const runTag = randomUUID().slice(0, 8);

export async function makeAccount(name = 'Test account') {
  const [a] = await db
    .insert(accounts)
    .values({
      name: `${name} ${runTag}-${randomUUID().slice(0, 4)}`,
      billingContactEmail: `billing-${randomUUID().slice(0, 6)}@customer.example`,
    })
    .returning();
  if (!a) throw new Error('no account');
  return a;
}

export async function makeUser(
  role: UserRole,
  accountId?: string,
  extra: { passwordHash?: string; unverified?: boolean } = {},
): Promise<CurrentUser> {
  const email = `${role}-${randomUUID().slice(0, 8)}@test.example`;
  const [u] = await db
    .insert(users)
    .values({
      email,
      name: `Test ${role}`,
      role,
      passwordHash: extra.passwordHash,
      emailVerifiedAt: extra.unverified ? null : new Date(),
    })
    .returning();
  if (!u) throw new Error('no user');
  if (accountId) await db.insert(memberships).values({ accountId, userId: u.id });
  return { id: u.id, email, name: u.name, role, accountId: accountId ?? null, unitSystem: 'si' };
}

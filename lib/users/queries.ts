import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, memberships, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can, type UserRole } from '@/lib/auth/roles';
import { AppError } from '@/lib/errors';

export type UserSummary = {
  id: string;
  name: string;
  email: string;
  role: UserRole;
  accountId: string | null;
  accountName: string | null;
  disabledAt: Date | null;
  createdAt: Date;
};

/** Everyone with a Dutywise sign-in, for the people and roles page (admins only). */
export async function listUsers(actor: CurrentUser): Promise<UserSummary[]> {
  if (!can(actor.role, 'users:manage')) throw new AppError('forbidden', 'Your role does not allow this.');
  return db
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      role: users.role,
      accountId: memberships.accountId,
      accountName: accounts.name,
      disabledAt: users.disabledAt,
      createdAt: users.createdAt,
    })
    .from(users)
    .leftJoin(memberships, eq(memberships.userId, users.id))
    .leftJoin(accounts, eq(accounts.id, memberships.accountId))
    .orderBy(asc(users.role), asc(users.name))
    .limit(1000);
}

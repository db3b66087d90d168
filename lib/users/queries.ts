import 'server-only';
import { asc, eq, ilike, or } from 'drizzle-orm';
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

const like = (q: string) => `%${q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;

/** Everyone with a Dutywise sign-in, for the people and roles page (admins only); `q` matches name, e-mail or company. */
export async function listUsers(actor: CurrentUser, q?: string): Promise<UserSummary[]> {
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
    .where(q ? or(ilike(users.name, like(q)), ilike(users.email, like(q)), ilike(accounts.name, like(q))) : undefined)
    .orderBy(asc(users.role), asc(users.name))
    .limit(1000);
}

import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, invitations } from '@/db/schema';
import { hashToken } from '@/lib/accounts/mutations';
import type { UserRole } from '@/lib/auth/roles';

export type InvitationPreview = { email: string; accountName: string | null; role: UserRole; expiresAt: Date };

/**
 * What an invitation link offers, so the page can say who is joining which customer account before
 * anything is created. Null for an unknown, used or expired token; the token itself proves the right to see this.
 */
export async function getInvitationPreview(token: string): Promise<InvitationPreview | null> {
  const [row] = await db
    .select({
      email: invitations.email,
      accountName: accounts.name,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .leftJoin(accounts, eq(accounts.id, invitations.accountId))
    .where(
      and(
        eq(invitations.tokenHash, hashToken(token)),
        isNull(invitations.acceptedAt),
        sql`${invitations.expiresAt} > now()`,
      ),
    )
    .limit(1);
  return row ?? null;
}

import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { accounts, users } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { consume, digestKey } from '@/lib/ratelimit/limit';
import { issueEmailToken, useEmailToken } from './email-tokens';
import { safeNextPath } from '@/lib/security/safe-redirect';

export const VERIFY_HOURS = 48;

/** Whether another mail may go to this address now (per-recipient budget); a refusal is logged, never shown. */
export async function mayMail(address: string): Promise<boolean> {
  const d = await consume('mail-to-address', digestKey(address));
  if (!d.allowed) logger.warn({ component: 'identity' }, 'mail to one address held back by its hourly limit');
  return d.allowed;
}

/** Queues the one-time confirmation link for a user's address, in the caller's transaction. */
export async function sendVerification(
  tx: Tx,
  user: { id: string; email: string; name: string },
  next?: string,
): Promise<void> {
  const token = await issueEmailToken(tx, user.id, 'verify-email', VERIFY_HOURS * 60);
  // Where to go after confirming and signing in, when it is a path on this site (a desk link with its inputs).
  const then = next ? safeNextPath(next, env.APP_URL, '') : '';
  const verifyUrl = `${env.APP_URL}/verify/${token}${then ? `?next=${encodeURIComponent(then)}` : ''}`;
  await enqueueEmail(tx, {
    template: 'verify-email',
    to: user.email,
    entity: { type: 'user', id: user.id },
    props: { name: user.name, verifyUrl, expiresInHours: VERIFY_HOURS },
  });
}

/** Sends a fresh link to an unverified user (after a sign-in with the right password), within the mail budget. */
export async function resendVerification(userId: string): Promise<void> {
  const [u] = await db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .where(and(eq(users.id, userId), isNull(users.emailVerifiedAt)))
    .limit(1);
  if (!u || !(await mayMail(u.email))) return;
  await db.transaction((tx) => sendVerification(tx, u));
}

/**
 * Uses a confirmation link: the address is verified, and the account the person signed up with gets it as its
 * billing contact (only now). Null when the link is unknown, used or expired.
 */
export async function verifyEmailToken(token: string): Promise<{ userId: string } | null> {
  return db.transaction(async (tx) => {
    const userId = await useEmailToken(tx, token, 'verify-email');
    if (!userId) return null;
    const [u] = await tx
      .update(users)
      .set({ emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())`, updatedAt: new Date() })
      .where(and(eq(users.id, userId), isNull(users.disabledAt)))
      .returning({ id: users.id, email: users.email, role: users.role });
    if (!u) return null;
    const [acct] = await tx
      .update(accounts)
      .set({ billingContactEmail: u.email, updatedAt: new Date() })
      .where(and(eq(accounts.createdByUserId, u.id), isNull(accounts.billingContactEmail)))
      .returning({ id: accounts.id });
    await writeAudit(tx, {
      actor: { id: u.id, role: u.role },
      action: 'user.email_verified',
      entityType: 'user',
      entityId: u.id,
      accountId: acct?.id ?? null,
      detail: { email: u.email },
    });
    return { userId: u.id };
  });
}

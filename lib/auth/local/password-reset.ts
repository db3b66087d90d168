import 'server-only';
import { and, eq, isNotNull, isNull, sql } from 'drizzle-orm';
import { db } from '@/db';
import { users } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { issueEmailToken, peekEmailToken, useEmailToken } from './email-tokens';
import { hashPassword } from './passwords';
import { closeAllSessions } from './session-store';
import { mayMail } from './verification';

export const RESET_MINUTES = 60;

/**
 * Mails a one-time reset link when the address has a local sign-in; does nothing otherwise. The caller answers
 * the same either way, so the form tells nobody which addresses exist.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const [u] = await db
    .select({ id: users.id, email: users.email })
    .from(users)
    .where(
      and(eq(sql`lower(${users.email})`, email.toLowerCase()), isNull(users.disabledAt), isNotNull(users.passwordHash)),
    )
    .limit(1);
  if (!u || !(await mayMail(u.email))) return;
  await db.transaction(async (tx) => {
    const token = await issueEmailToken(tx, u.id, 'reset-password', RESET_MINUTES);
    await enqueueEmail(tx, {
      template: 'password-reset',
      to: u.email,
      entity: { type: 'user', id: u.id },
      props: { resetUrl: `${env.APP_URL}/reset-password/${token}`, expiresInMinutes: RESET_MINUTES },
    });
  });
}

/**
 * Sets a new password from a reset link. The token is checked before the password is hashed; then, in one
 * transaction, the token is used, the hash stored, the address counted as verified (the link proved it) and every
 * session of the user ended. False when the link is not live.
 */
export async function resetPassword(token: string, password: string): Promise<boolean> {
  if (!(await peekEmailToken(token, 'reset-password'))) return false;
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const userId = await useEmailToken(tx, token, 'reset-password');
    if (!userId) return false;
    const [u] = await tx
      .update(users)
      .set({
        passwordHash,
        emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())`,
        updatedAt: new Date(),
      })
      .where(and(eq(users.id, userId), isNull(users.disabledAt)))
      .returning({ id: users.id, role: users.role });
    if (!u) return false;
    await closeAllSessions(tx, u.id);
    await writeAudit(tx, {
      actor: { id: u.id, role: u.role },
      action: 'user.password_reset',
      entityType: 'user',
      entityId: u.id,
    });
    return true;
  });
}

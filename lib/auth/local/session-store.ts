import 'server-only';
import { and, eq, lt } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { userSessions } from '@/db/schema';
import { env } from '@/lib/env';
import { signLocalSession } from './session-token';

// Server-side session rows: a cookie is only as good as the row it names. Signing out deletes the row; a password
// change, a reset or disabling the user deletes every row of that user, which ends all their sessions at once.

/** Opens a session row for the user and returns its signed cookie value and lifetime. */
export async function openSession(userId: string): Promise<{ token: string; ttlSeconds: number }> {
  const ttlSeconds = env.SESSION_TTL_HOURS * 3600;
  const [row] = await db
    .insert(userSessions)
    .values({ userId, expiresAt: new Date(Date.now() + ttlSeconds * 1000) })
    .returning({ id: userSessions.id });
  if (!row) throw new Error('session insert returned no row');
  // The same user's expired rows go while we are here; the job worker's session sweep clears everyone's (lib/jobs).
  await db.delete(userSessions).where(and(eq(userSessions.userId, userId), lt(userSessions.expiresAt, new Date())));
  return { token: await signLocalSession(userId, row.id, env.SESSION_SECRET, ttlSeconds), ttlSeconds };
}

/** Ends one session. */
export async function closeSession(sessionId: string): Promise<void> {
  await db.delete(userSessions).where(eq(userSessions.id, sessionId));
}

/** Ends every session of a user, inside the caller's transaction (password change, reset, disabling). */
export async function closeAllSessions(tx: Tx, userId: string): Promise<void> {
  await tx.delete(userSessions).where(eq(userSessions.userId, userId));
}

/** Deletes expired session rows; run by the worker's housekeeping. */
export async function sweepExpiredSessions(): Promise<number> {
  const gone = await db
    .delete(userSessions)
    .where(lt(userSessions.expiresAt, new Date()))
    .returning({ id: userSessions.id });
  return gone.length;
}

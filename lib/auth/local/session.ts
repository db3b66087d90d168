import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { cookies } from 'next/headers';
import { db } from '@/db';
import { users } from '@/db/schema';
import { env } from '@/lib/env';
import { verifyPassword } from './passwords';
import { LOCAL_SESSION_COOKIE, signLocalSession } from './session-token';

/** Checks an e-mail and password against the local identity; null on any mismatch. */
export async function checkLocalCredentials(email: string, password: string) {
  const [row] = await db
    .select({ id: users.id, role: users.role, passwordHash: users.passwordHash })
    .from(users)
    .where(and(eq(sql`lower(${users.email})`, email.toLowerCase()), isNull(users.disabledAt)))
    .limit(1);
  const ok = await verifyPassword(password, row?.passwordHash ?? null);
  return ok && row ? { id: row.id, role: row.role } : null;
}

function cookieSecure(): boolean {
  return env.COOKIE_SECURE ?? env.APP_URL.startsWith('https://');
}

/** Sets the signed, http-only, SameSite=Lax session cookie. */
export async function startLocalSession(userId: string, role: string): Promise<void> {
  const ttl = env.SESSION_TTL_HOURS * 3600;
  const token = await signLocalSession(userId, role, env.SESSION_SECRET, ttl);
  (await cookies()).set(LOCAL_SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: cookieSecure(),
    path: '/',
    maxAge: ttl,
  });
}

export async function endLocalSession(): Promise<void> {
  (await cookies()).delete(LOCAL_SESSION_COOKIE);
}

import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { cookies, headers } from 'next/headers';
import { db } from '@/db';
import { users } from '@/db/schema';
import { appHttps, env } from '@/lib/env';
import { verifyPassword } from './passwords';
import { closeSession, openSession } from './session-store';
import { LOCAL_SESSION_COOKIE, verifyLocalSession } from './session-token';

export type CredentialCheck =
  | { status: 'ok'; user: { id: string; role: string } }
  | { status: 'unverified'; user: { id: string; email: string } }
  | { status: 'mismatch' };

/** Checks an e-mail and password against the local identity. Disabled users read as a mismatch. */
export async function checkLocalCredentials(email: string, password: string): Promise<CredentialCheck> {
  const [row] = await db
    .select({
      id: users.id,
      email: users.email,
      role: users.role,
      passwordHash: users.passwordHash,
      verifiedAt: users.emailVerifiedAt,
    })
    .from(users)
    .where(and(eq(sql`lower(${users.email})`, email.toLowerCase()), isNull(users.disabledAt)))
    .limit(1);
  const ok = await verifyPassword(password, row?.passwordHash ?? null);
  if (!ok || !row) return { status: 'mismatch' };
  if (!row.verifiedAt) return { status: 'unverified', user: { id: row.id, email: row.email } };
  return { status: 'ok', user: { id: row.id, role: row.role } };
}

// Secure whenever the app is served over https: its public URL says so, or this request arrived over https
// (marking a cookie Secure needlessly cannot weaken it, so the forwarded protocol is taken as given here).
async function cookieSecure(): Promise<boolean> {
  if (appHttps) return true;
  const proto = (await headers()).get('x-forwarded-proto')?.split(',')[0]?.trim();
  return proto === 'https';
}

/** Opens a server-side session and sets its signed, http-only, SameSite=Lax cookie. */
export async function startLocalSession(userId: string): Promise<void> {
  const { token, ttlSeconds } = await openSession(userId);
  (await cookies()).set(LOCAL_SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: await cookieSecure(),
    path: '/',
    maxAge: ttlSeconds,
  });
}

/** Ends this session on the server (its cookie stops working everywhere at once) and clears the cookie. */
export async function endLocalSession(): Promise<void> {
  const store = await cookies();
  const claims = await verifyLocalSession(store.get(LOCAL_SESSION_COOKIE)?.value, env.SESSION_SECRET);
  if (claims) await closeSession(claims.sid);
  store.delete(LOCAL_SESSION_COOKIE);
}

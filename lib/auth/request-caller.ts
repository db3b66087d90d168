import 'server-only';
import { authenticateApiKey, type KeyCaller } from '@/lib/api-keys/authenticate';
import { bearerToken } from '@/lib/api-keys/format';
import { clerkEnabled, env } from '@/lib/env';
import { clientKey } from '@/lib/ratelimit/client';
import { LOCAL_SESSION_COOKIE, verifyLocalSession } from './local/session-token';

/** Who is calling a public API: a machine with an API key, a signed-in person (the desk), or someone anonymous. */
export type ApiCaller =
  | { kind: 'api-key'; key: KeyCaller }
  | { kind: 'user'; userId: string }
  | { kind: 'anonymous'; address: string }
  | { kind: 'bad-key' };

function cookie(headers: Headers, name: string): string | undefined {
  for (const part of (headers.get('cookie') ?? '').split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return decodeURIComponent(part.slice(eq + 1).trim());
  }
  return undefined;
}

// The session is checked by its signature alone (no database read), so the desk keeps calculating, under its
// own limit, while the database is down; the person's record is checked wherever something is read or saved.
async function signedInId(headers: Headers): Promise<string | null> {
  if (clerkEnabled) {
    const token = cookie(headers, '__session');
    if (!token) return null;
    const { verifyToken } = await import('@clerk/nextjs/server');
    const claims = await verifyToken(token, { jwtKey: env.CLERK_JWT_KEY, secretKey: env.CLERK_SECRET_KEY }).catch(
      () => null,
    );
    return claims?.sub ? `clerk:${claims.sub}` : null;
  }
  const claims = await verifyLocalSession(cookie(headers, LOCAL_SESSION_COOKIE), env.SESSION_SECRET);
  return claims?.sub ?? null;
}

/**
 * Identifies the caller. A request that presents an API key is judged by the key alone (an unknown or revoked
 * key is refused, never downgraded to anonymous); reading the key needs the database, so that throws when it is down.
 */
export async function identifyApiCaller(req: Request): Promise<ApiCaller> {
  const token = bearerToken(req.headers);
  if (token !== null) {
    const key = token ? await authenticateApiKey(token) : null;
    return key ? { kind: 'api-key', key } : { kind: 'bad-key' };
  }
  const userId = await signedInId(req.headers);
  if (userId) return { kind: 'user', userId };
  return { kind: 'anonymous', address: clientKey(req.headers) };
}

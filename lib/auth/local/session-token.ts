import { jwtVerify, SignJWT } from 'jose';

// The local identity's session: an HS256-signed token in an http-only cookie naming the user and the
// server-side session row (lib/auth/local/session-store.ts) that every request checks is still there.
// Edge-safe (jose only), so middleware can check the signature as well as server code.
export const LOCAL_SESSION_COOKIE = 'dw_session';
const ISSUER = 'dutywise-local-identity';

export type LocalSessionClaims = { sub: string; sid: string; exp: number };

function keyOf(secret: string): Uint8Array {
  return new TextEncoder().encode(secret);
}

/** Signs a token for a user id and session id that expires after `ttlSeconds`. */
export async function signLocalSession(
  userId: string,
  sessionId: string,
  secret: string,
  ttlSeconds: number,
): Promise<string> {
  return new SignJWT({ sid: sessionId })
    .setProtectedHeader({ alg: 'HS256' })
    .setSubject(userId)
    .setIssuer(ISSUER)
    .setIssuedAt()
    .setExpirationTime(Math.floor(Date.now() / 1000) + ttlSeconds)
    .sign(keyOf(secret));
}

/** Returns the claims of a valid, unexpired token, or null for anything else. */
export async function verifyLocalSession(
  token: string | undefined,
  secret: string,
): Promise<LocalSessionClaims | null> {
  if (!token || token.length > 4096) return null;
  try {
    const { payload } = await jwtVerify(token, keyOf(secret), { issuer: ISSUER, algorithms: ['HS256'] });
    if (typeof payload.sub !== 'string' || typeof payload.sid !== 'string' || typeof payload.exp !== 'number')
      return null;
    return { sub: payload.sub, sid: payload.sid, exp: payload.exp };
  } catch {
    return null;
  }
}

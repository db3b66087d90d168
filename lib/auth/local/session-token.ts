import { jwtVerify, SignJWT } from 'jose';

// The local identity's session: an HS256-signed token in an http-only cookie. Edge-safe (jose only),
// so middleware can check it as well as server code.
export const LOCAL_SESSION_COOKIE = 'dw_session';
const ISSUER = 'dutywise-local-identity';

export type LocalSessionClaims = { sub: string; role: string; exp: number };

function keyOf(secret: string): Uint8Array {
  return new TextEncoder().encode(secret);
}

/** Signs a session for a user id that expires after `ttlSeconds`. */
export async function signLocalSession(
  userId: string,
  role: string,
  secret: string,
  ttlSeconds: number,
): Promise<string> {
  return new SignJWT({ role })
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
    if (typeof payload.sub !== 'string' || typeof payload.role !== 'string' || typeof payload.exp !== 'number')
      return null;
    return { sub: payload.sub, role: payload.role, exp: payload.exp };
  } catch {
    return null;
  }
}

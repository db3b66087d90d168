import { exportSPKI, generateKeyPair, SignJWT, type CryptoKey } from 'jose';

// A Clerk-shaped identity made entirely in the test: a key pair, a publishable key that encodes the
// frontend host, and RS256 session tokens signed with the private key. No network is involved.
export const clerkHost = 'clerk.dutywise.test';
export const publishableKey = `pk_live_${Buffer.from(`${clerkHost}$`).toString('base64')}`;

export async function makeClerkKeys() {
  const { privateKey, publicKey } = await generateKeyPair('RS256', { extractable: true });
  return { privateKey, publicPem: await exportSPKI(publicKey) };
}

export async function signClerkSession(
  privateKey: CryptoKey,
  opts: { sub: string; expiresInS?: number; iatOffsetS?: number },
) {
  const now = Math.floor(Date.now() / 1000) + (opts.iatOffsetS ?? 0);
  return new SignJWT({ sid: 'sess_test_1', azp: 'https://desk.dutywise.test' })
    .setProtectedHeader({ alg: 'RS256', kid: 'ins_test' })
    .setIssuer(`https://${clerkHost}`)
    .setSubject(opts.sub)
    .setIssuedAt(now - 5)
    .setNotBefore(now - 5)
    .setExpirationTime(now + (opts.expiresInS ?? 300))
    .sign(privateKey);
}

import { createHash, randomBytes } from 'node:crypto';

// An API key reads `dwk_<id>_<secret>`: the id (8 characters) is stored as it is and shown in lists so a
// key can be recognised; the secret (32 random bytes) is never stored. What is stored is the SHA-256 of the
// whole key: a key is 256 random bits, so a fast hash is enough (no password stretching is needed) [cp].
const ID_ALPHABET = 'abcdefghijkmnpqrstuvwxyz23456789';
const KEY = /^(dwk_[a-z2-9]{8})_([A-Za-z0-9_-]{43})$/;

export type NewApiKey = { key: string; prefix: string; secretHash: string };

/** A fresh key, its public prefix and the hash to store. The key itself is shown once and then forgotten. */
export function generateApiKey(): NewApiKey {
  const id = [...randomBytes(8)].map((b) => ID_ALPHABET[b % ID_ALPHABET.length]).join('');
  const prefix = `dwk_${id}`;
  const key = `${prefix}_${randomBytes(32).toString('base64url')}`;
  return { key, prefix, secretHash: hashApiKey(key) };
}

/** The stored form of a key. */
export function hashApiKey(key: string): string {
  return createHash('sha256').update(key).digest('hex');
}

/** The prefix of a well-formed key, or null for anything that cannot be one of ours. */
export function apiKeyPrefix(key: string): string | null {
  return KEY.exec(key)?.[1] ?? null;
}

/** The key in an `Authorization: Bearer <key>` header: null when there is no such header. */
export function bearerToken(headers: Headers): string | null {
  const auth = headers.get('authorization');
  if (!auth) return null;
  const m = /^Bearer\s+(\S+)\s*$/i.exec(auth);
  return m?.[1] ?? '';
}

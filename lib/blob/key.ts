import { z } from 'zod';

/** A key that is not namespaced by account, or a part that could escape its folder. */
export class BlobKeyError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BlobKeyError';
  }
}

const accountIdSchema = z.uuid();
// One path segment: no slashes, no "." or ".." tricks, nothing a URL or a shell would reinterpret.
const SEGMENT = /^[A-Za-z0-9][A-Za-z0-9._-]{0,127}$/;
const KEY = /^accounts\/([0-9a-f-]{36})\/(.+)$/;

/** Builds `accounts/<accountId>/<part>/<part>...`, refusing any part that is not one plain segment. */
export function accountKey(accountId: string, ...parts: string[]): string {
  if (!accountIdSchema.safeParse(accountId).success)
    throw new BlobKeyError(`accountId must be a UUID (got ${JSON.stringify(accountId)})`);
  if (parts.length === 0) throw new BlobKeyError('a blob key needs at least one part after the account id');
  for (const part of parts) {
    if (!SEGMENT.test(part) || part.includes('..')) {
      throw new BlobKeyError(
        `blob key part ${JSON.stringify(part)} must be 1-128 letters, digits, ".", "_" or "-", starting with a letter or digit`,
      );
    }
  }
  return ['accounts', accountId.toLowerCase(), ...parts].join('/');
}

/** The account a key belongs to; throws BlobKeyError for a key outside the account namespace. */
export function accountIdOfKey(key: string): string {
  const m = KEY.exec(key);
  const id = m?.[1];
  if (!m || !id || !accountIdSchema.safeParse(id).success)
    throw new BlobKeyError(`blob key ${JSON.stringify(key)} is not under accounts/<accountId>/`);
  const rest = m[2] ?? '';
  if (rest.split('/').some((p) => !SEGMENT.test(p) || p.includes('..')))
    throw new BlobKeyError(`blob key ${JSON.stringify(key)} has an unsafe part`);
  return id;
}

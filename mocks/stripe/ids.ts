import { randomBytes } from 'node:crypto';

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/** A Stripe-looking id: the given prefix (cus, sub, cs_test ...), an underscore, 24 random characters. */
export function newId(prefix: string, length = 24): string {
  const bytes = randomBytes(length);
  let body = '';
  // 62 does not divide 256 evenly; the slight bias is irrelevant for opaque ids.
  for (const byte of bytes) body += ALPHABET[byte % ALPHABET.length];
  return `${prefix}_${body}`;
}

/** Seconds since the Unix epoch, the unit of every Stripe timestamp. */
export function nowSeconds(): number {
  return Math.floor(Date.now() / 1000);
}

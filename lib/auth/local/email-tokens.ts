import 'server-only';
import { and, eq, gt, isNull } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import { db, type Tx } from '@/db';
import { emailTokens, type EmailTokenPurpose } from '@/db/schema';

// One-time links sent by e-mail. The token (32 random bytes, base64url) travels only in the mail; the database
// keeps its SHA-256, so a copy of the table opens nothing. Using a token marks it used in the same transaction
// as its effect; a newer token of the same purpose replaces the older ones.

export function tokenDigest(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** Issues a token for the user and purpose, valid for `ttlMinutes`, revoking earlier unused ones. */
export async function issueEmailToken(
  tx: Tx,
  userId: string,
  purpose: EmailTokenPurpose,
  ttlMinutes: number,
): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await tx
    .update(emailTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(emailTokens.userId, userId), eq(emailTokens.purpose, purpose), isNull(emailTokens.usedAt)));
  await tx.insert(emailTokens).values({
    userId,
    purpose,
    tokenHash: tokenDigest(token),
    expiresAt: new Date(Date.now() + ttlMinutes * 60_000),
  });
  return token;
}

function live(token: string, purpose: EmailTokenPurpose) {
  return and(
    eq(emailTokens.tokenHash, tokenDigest(token)),
    eq(emailTokens.purpose, purpose),
    isNull(emailTokens.usedAt),
    gt(emailTokens.expiresAt, new Date()),
  );
}

/** The user a live token belongs to, without using it (to show a form, or to check before hashing a password). */
export async function peekEmailToken(token: string, purpose: EmailTokenPurpose): Promise<string | null> {
  const [row] = await db.select({ userId: emailTokens.userId }).from(emailTokens).where(live(token, purpose)).limit(1);
  return row?.userId ?? null;
}

/** Uses a live token inside the caller's transaction; the user it belongs to, or null if it is not live. */
export async function useEmailToken(tx: Tx, token: string, purpose: EmailTokenPurpose): Promise<string | null> {
  const [row] = await tx
    .update(emailTokens)
    .set({ usedAt: new Date() })
    .where(live(token, purpose))
    .returning({ userId: emailTokens.userId });
  return row?.userId ?? null;
}

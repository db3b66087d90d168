import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { db } from '@/db';
import { apiKeys, apiKeyUsage, users } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import { apiKeyPrefix, hashApiKey } from './format';
import { utcToday } from './scope';

/** A verified key: whose it is and what it may do. */
export type KeyCaller = {
  keyId: string;
  prefix: string;
  name: string;
  accountId: string | null;
  owner: { id: string; role: string };
  perMinute: number;
};

/**
 * The key's record when the key is genuine, not revoked, and its owner still enabled; null otherwise. Looked up
 * on every request, so a revoked key is refused by every instance from the next request on.
 */
export async function authenticateApiKey(key: string): Promise<KeyCaller | null> {
  const prefix = apiKeyPrefix(key);
  if (!prefix) return null;
  const [row] = await db
    .select({
      keyId: apiKeys.id,
      prefix: apiKeys.prefix,
      name: apiKeys.name,
      accountId: apiKeys.accountId,
      ownerId: users.id,
      ownerRole: users.role,
      perMinute: apiKeys.perMinute,
    })
    .from(apiKeys)
    .innerJoin(users, eq(users.id, apiKeys.ownerUserId))
    .where(
      and(
        eq(apiKeys.prefix, prefix),
        eq(apiKeys.secretHash, hashApiKey(key)),
        isNull(apiKeys.revokedAt),
        isNull(users.disabledAt),
      ),
    )
    .limit(1);
  if (!row) return null;
  const { ownerId, ownerRole, ...rest } = row;
  return { ...rest, owner: { id: ownerId, role: ownerRole } };
}

/**
 * Counts one answered request against the key's day and writes its audit entry, attributed to the key's account
 * and owner, in one transaction.
 */
export async function recordKeyUse(caller: KeyCaller, detail: Record<string, unknown>): Promise<void> {
  await db.transaction(async (tx) => {
    await tx
      .insert(apiKeyUsage)
      .values({ keyId: caller.keyId, day: utcToday, count: 1 })
      .onConflictDoUpdate({
        target: [apiKeyUsage.keyId, apiKeyUsage.day],
        set: { count: sql`${apiKeyUsage.count} + 1` },
      });
    await tx.update(apiKeys).set({ lastUsedAt: new Date() }).where(eq(apiKeys.id, caller.keyId));
    await writeAudit(tx, {
      actor: caller.owner,
      action: 'api.calculated',
      entityType: 'api_key',
      entityId: caller.keyId,
      accountId: caller.accountId,
      detail: { key: caller.prefix, keyName: caller.name, ...detail },
    });
  });
}

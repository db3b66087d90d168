import 'server-only';
import { and, count, eq, isNull, sql } from 'drizzle-orm';
import { db } from '@/db';
import { apiKeys } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { isStaff } from '@/lib/auth/roles';
import { generateApiKey } from './format';
import { keyScope } from './scope';
import { API_KEY_ACTIVE_LIMIT, type ApiKeyCreateInput } from './schema';
import { AppError } from '@/lib/errors';

/** Creates a key; the answer holds the key itself, which is never shown again. */
export async function createApiKey(user: CurrentUser, input: ApiKeyCreateInput) {
  if (!isStaff(user.role) && !user.accountId)
    throw new AppError('forbidden', 'API keys belong to a customer account, and you have none yet.');
  const scope = keyScope(user);
  const made = generateApiKey();
  return db.transaction(async (tx) => {
    // Serialise creations per owner so two at once cannot both pass the count.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`api-keys:${user.accountId ?? user.id}`}))`);
    const [active] = await tx
      .select({ n: count() })
      .from(apiKeys)
      .where(and(scope, isNull(apiKeys.revokedAt)));
    if ((active?.n ?? 0) >= API_KEY_ACTIVE_LIMIT)
      throw new AppError(
        'conflict',
        `At most ${API_KEY_ACTIVE_LIMIT} keys can be active; revoke one you no longer use.`,
      );
    const [row] = await tx
      .insert(apiKeys)
      .values({
        accountId: isStaff(user.role) ? null : user.accountId,
        ownerUserId: user.id,
        name: input.name,
        prefix: made.prefix,
        secretHash: made.secretHash,
        perMinute: input.perMinute,
      })
      .returning({ id: apiKeys.id });
    if (!row) throw new Error('api key insert returned no row');
    await writeAudit(tx, {
      actor: user,
      action: 'api_key.created',
      entityType: 'api_key',
      entityId: row.id,
      accountId: user.accountId,
      detail: { name: input.name, prefix: made.prefix, perMinute: input.perMinute },
    });
    return { id: row.id, prefix: made.prefix, key: made.key, name: input.name };
  });
}

/** Revokes a key at once: its next request is refused with 401. Another owner's key is answered as not found. */
export async function revokeApiKey(user: CurrentUser, keyId: string): Promise<{ prefix: string }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(apiKeys)
      .set({ revokedAt: new Date(), revokedByUserId: user.id })
      .where(and(eq(apiKeys.id, keyId), keyScope(user), isNull(apiKeys.revokedAt)))
      .returning({ prefix: apiKeys.prefix, accountId: apiKeys.accountId, name: apiKeys.name });
    if (!row) throw new AppError('not_found', 'No active key with that id.');
    await writeAudit(tx, {
      actor: user,
      action: 'api_key.revoked',
      entityType: 'api_key',
      entityId: keyId,
      accountId: row.accountId,
      detail: { name: row.name, prefix: row.prefix },
    });
    return { prefix: row.prefix };
  });
}

import 'server-only';
import { and, desc, eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { apiKeys, apiKeyUsage, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { keyScope, utcToday } from './scope';

export type ApiKeyRow = {
  id: string;
  name: string;
  prefix: string;
  perMinute: number;
  createdAt: Date;
  createdBy: string;
  lastUsedAt: Date | null;
  revokedAt: Date | null;
  usedToday: number;
};

/** The keys the user manages, newest first, with today's request count. Never the key or its hash. */
export async function listApiKeys(user: CurrentUser): Promise<ApiKeyRow[]> {
  return db
    .select({
      id: apiKeys.id,
      name: apiKeys.name,
      prefix: apiKeys.prefix,
      perMinute: apiKeys.perMinute,
      createdAt: apiKeys.createdAt,
      createdBy: users.name,
      lastUsedAt: apiKeys.lastUsedAt,
      revokedAt: apiKeys.revokedAt,
      usedToday: sql<number>`coalesce(${apiKeyUsage.count}, 0)::int`,
    })
    .from(apiKeys)
    .innerJoin(users, eq(users.id, apiKeys.ownerUserId))
    .leftJoin(apiKeyUsage, and(eq(apiKeyUsage.keyId, apiKeys.id), eq(apiKeyUsage.day, utcToday)))
    .where(keyScope(user))
    .orderBy(desc(apiKeys.createdAt))
    .limit(200);
}

import { sql } from 'drizzle-orm';
import {
  check,
  date,
  index,
  integer,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { users } from './users';

/**
 * Keys for machine clients of the public API. A customer's key acts for its account; a vendor staff member's
 * key (no account) acts for that person. Only the SHA-256 of the key is stored; its prefix identifies it.
 */
export const apiKeys = pgTable(
  'api_keys',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    accountId: uuid('account_id').references(() => accounts.id, { onDelete: 'restrict' }),
    ownerUserId: uuid('owner_user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    prefix: text('prefix').notNull(),
    secretHash: text('secret_hash').notNull(),
    perMinute: integer('per_minute').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    lastUsedAt: timestamp('last_used_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    revokedByUserId: uuid('revoked_by_user_id').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    uniqueIndex('api_keys_prefix_uq').on(t.prefix),
    index('api_keys_account_idx').on(t.accountId),
    index('api_keys_owner_idx').on(t.ownerUserId),
    check('api_keys_name_length', sql`char_length(${t.name}) between 1 and 80`),
    check('api_keys_per_minute', sql`${t.perMinute} between 1 and 100000`),
    check('api_keys_hash', sql`${t.secretHash} ~ '^[0-9a-f]{64}$'`),
  ],
);

/** Requests served per key and day (UTC), counted as they are answered. */
export const apiKeyUsage = pgTable(
  'api_key_usage',
  {
    keyId: uuid('key_id')
      .notNull()
      .references(() => apiKeys.id, { onDelete: 'cascade' }),
    day: date('day').notNull(),
    count: integer('count').notNull().default(0),
  },
  (t) => [primaryKey({ columns: [t.keyId, t.day] })],
);

export type ApiKey = typeof apiKeys.$inferSelect;

import { sql } from 'drizzle-orm';
import {
  bigint,
  bigserial,
  check,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { outboxStatus } from './enums';
import { users } from './users';

/** Who did what, when. Written in the same transaction as the change it records. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    actorUserId: uuid('actor_user_id').references(() => users.id, { onDelete: 'set null' }),
    actorRole: text('actor_role'),
    action: text('action').notNull(),
    entityType: text('entity_type').notNull(),
    entityId: text('entity_id').notNull(),
    accountId: uuid('account_id').references(() => accounts.id, { onDelete: 'set null' }),
    detail: jsonb('detail'),
  },
  (t) => [
    index('audit_entity_idx').on(t.entityType, t.entityId, t.at.desc()),
    index('audit_account_idx').on(t.accountId, t.at.desc()),
    index('audit_at_idx').on(t.at.desc()),
  ],
);

/**
 * Outgoing e-mail: one row per message, the record support sees (status, attempts, last error). Delivery
 * runs as a job on pg-boss's mail queue whose id is the row's id (lib/email/enqueue.ts).
 */
export const outbox = pgTable(
  'outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    template: text('template').notNull(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    payload: jsonb('payload').notNull(),
    accountId: uuid('account_id').references(() => accounts.id, { onDelete: 'set null' }),
    entityType: text('entity_type'),
    entityId: text('entity_id'),
    dedupeKey: text('dedupe_key'),
    status: outboxStatus('status').notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    messageId: text('message_id'),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('outbox_entity_idx').on(t.entityType, t.entityId),
    uniqueIndex('outbox_dedupe_uq').on(t.dedupeKey),
    check('outbox_attempts_nonneg', sql`${t.attempts} >= 0`),
  ],
);

/**
 * Rate-limit counters shared by every app instance, in the layout rate-limiter-flexible's PostgreSQL store
 * reads and writes (key, points, expire in epoch milliseconds). Created here so the app's role needs no DDL.
 */
export const rateLimitCounters = pgTable(
  'rate_limit_counters',
  {
    key: varchar('key', { length: 255 }).primaryKey(),
    points: integer('points').notNull().default(0),
    expire: bigint('expire', { mode: 'number' }),
  },
  (t) => [index('rate_limit_counters_expire_idx').on(t.expire)],
);

export type AuditEntry = typeof auditLog.$inferSelect;
export type OutboxRow = typeof outbox.$inferSelect;

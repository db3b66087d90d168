import { sql } from 'drizzle-orm';
import { check, index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { users } from './users';

/**
 * One row per local-identity sign-in. The session cookie names its row, and every request checks the row is
 * still there: signing out deletes it, a password change or disabling the user deletes all of the user's.
 */
export const userSessions = pgTable(
  'user_sessions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  },
  (t) => [index('user_sessions_user_idx').on(t.userId), index('user_sessions_expires_idx').on(t.expiresAt)],
);

/** What a mailed one-time link proves: ownership of the address, or the right to set a new password. */
export const emailTokenPurposes = ['verify-email', 'reset-password'] as const;
export type EmailTokenPurpose = (typeof emailTokenPurposes)[number];

/** One-time links sent by e-mail; only the SHA-256 of the token is stored. */
export const emailTokens = pgTable(
  'email_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: text('purpose').$type<EmailTokenPurpose>().notNull(),
    tokenHash: text('token_hash').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('email_tokens_hash_uq').on(t.tokenHash),
    index('email_tokens_user_idx').on(t.userId, t.purpose),
    check('email_tokens_purpose', sql`${t.purpose} in ('verify-email', 'reset-password')`),
  ],
);

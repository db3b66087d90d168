import { sql } from 'drizzle-orm';
import { index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { unitSystem, userRole } from './enums';

export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: userRole('role').notNull(),
    // Only the local identity stores a password hash; Clerk users have clerkUserId instead.
    passwordHash: text('password_hash'),
    clerkUserId: text('clerk_user_id'),
    unitSystem: unitSystem('unit_system').notNull().default('si'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    disabledAt: timestamp('disabled_at', { withTimezone: true }),
    // Set when the person follows the one-time link mailed to the address (or accepts an invitation sent to it,
    // or Clerk reports the address verified). Until then the sign-in cannot act and the address gets no billing mail.
    emailVerifiedAt: timestamp('email_verified_at', { withTimezone: true }),
  },
  (t) => [
    uniqueIndex('users_email_lower_uq').on(sql`lower(${t.email})`),
    uniqueIndex('users_clerk_user_id_uq').on(t.clerkUserId),
    index('users_role_idx').on(t.role),
  ],
);

export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;

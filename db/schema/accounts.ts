import { sql } from 'drizzle-orm';
import {
  check,
  doublePrecision,
  index,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { unitSystem, userRole } from './enums';
import { users } from './users';

/** A customer account: the company a vendor sizes equipment for, and the unit that subscribes. */
export const accounts = pgTable(
  'accounts',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    name: text('name').notNull(),
    site: text('site'),
    billingContactName: text('billing_contact_name'),
    billingContactEmail: text('billing_contact_email'),
    // Site barometric pressure drives gauge conversions; altitude is kept when that is what was given.
    barometricPressureKpa: doublePrecision('barometric_pressure_kpa'),
    siteAltitudeM: doublePrecision('site_altitude_m'),
    // The units the account's datasheets, e-mails and desk defaults use; the currency of its quote prices.
    unitSystem: unitSystem('unit_system').notNull().default('si'),
    currency: text('currency').notNull().default('USD'),
    stripeCustomerId: text('stripe_customer_id'),
    createdByUserId: uuid('created_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('accounts_name_trgm_idx').using('gin', sql`${t.name} gin_trgm_ops`),
    uniqueIndex('accounts_stripe_customer_uq').on(t.stripeCustomerId),
    check(
      'accounts_baro_range',
      sql`${t.barometricPressureKpa} is null or ${t.barometricPressureKpa} between 50 and 110`,
    ),
    check('accounts_currency_code', sql`${t.currency} ~ '^[A-Z]{3}$'`),
    check('accounts_altitude_range', sql`${t.siteAltitudeM} is null or ${t.siteAltitudeM} between -500 and 6000`),
  ],
);

/** Customer users belong to exactly one account (unique user id). */
export const memberships = pgTable(
  'memberships',
  {
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.accountId, t.userId] }), uniqueIndex('memberships_user_uq').on(t.userId)],
);

export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    // Customer invitations name their account; staff invitations (sales engineer, support, admin) name none.
    accountId: uuid('account_id').references(() => accounts.id, { onDelete: 'cascade' }),
    role: userRole('role').notNull().default('customer'),
    email: text('email').notNull(),
    tokenHash: text('token_hash').notNull(),
    invitedByUserId: uuid('invited_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('invitations_token_uq').on(t.tokenHash),
    index('invitations_account_idx').on(t.accountId),
    check('invitations_account_for_customers', sql`(${t.role} = 'customer') = (${t.accountId} is not null)`),
  ],
);

export type Account = typeof accounts.$inferSelect;
export type Membership = typeof memberships.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;

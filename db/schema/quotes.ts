import { sql } from 'drizzle-orm';
import {
  check,
  index,
  integer,
  jsonb,
  numeric,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { quoteStatus } from './enums';
import { sizings } from './sizings';
import { users } from './users';

export const quotes = pgTable(
  'quotes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    number: text('number').notNull(),
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'restrict' }),
    title: text('title').notNull(),
    status: quoteStatus('status').notNull().default('draft'),
    notes: text('notes'),
    createdByUserId: uuid('created_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('quotes_number_uq').on(t.number),
    // Number prefixes typed into the look-up (`DS26-05`), under any collation.
    index('quotes_number_pattern_idx').on(sql`${t.number} text_pattern_ops`),
    index('quotes_account_idx').on(t.accountId, t.createdAt.desc()),
    index('quotes_status_idx').on(t.status),
    index('quotes_title_trgm_idx').using('gin', sql`lower(${t.title}) gin_trgm_ops`),
  ],
);

export const quoteItems = pgTable(
  'quote_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    quoteId: uuid('quote_id')
      .notNull()
      .references(() => quotes.id, { onDelete: 'cascade' }),
    sizingId: uuid('sizing_id')
      .notNull()
      .references(() => sizings.id, { onDelete: 'restrict' }),
    quantity: integer('quantity').notNull().default(1),
    // Optional price of one unit in the account's currency; exact decimal, read as a string.
    unitPrice: numeric('unit_price', { precision: 14, scale: 2 }),
    position: integer('position').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('quote_items_quote_sizing_uq').on(t.quoteId, t.sizingId),
    index('quote_items_sizing_idx').on(t.sizingId),
    check('quote_items_quantity_range', sql`${t.quantity} between 1 and 1000`),
    check('quote_items_price_range', sql`${t.unitPrice} is null or ${t.unitPrice} >= 0`),
  ],
);

/** One datasheet revision a quote document holds (or none yet for its line), in line order. */
export type QuoteDocumentLine = {
  itemId: string;
  sizingNumber: string;
  datasheetNumber: string | null;
  revision: string | null;
  revisionId: string | null;
};

/**
 * The quote as one stored PDF (cover sheet, then each line's current datasheet), one edition per distinct state of
 * the quote and its datasheets. Immutable: a trigger in the migrations refuses UPDATE and DELETE.
 */
export const quoteDocuments = pgTable(
  'quote_documents',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    quoteId: uuid('quote_id')
      .notNull()
      .references(() => quotes.id, { onDelete: 'restrict' }),
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'restrict' }),
    edition: integer('edition').notNull(),
    /** SHA-256 of everything the document prints and holds; an unchanged quote reuses its latest edition. */
    contentKey: text('content_key').notNull(),
    lines: jsonb('lines').$type<QuoteDocumentLine[]>().notNull(),
    pageCount: integer('page_count').notNull(),
    blobKey: text('blob_key').notNull(),
    sha256: text('sha256').notNull(),
    byteSize: integer('byte_size').notNull(),
    madeByUserId: uuid('made_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    madeAt: timestamp('made_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('quote_documents_quote_idx').on(t.quoteId, t.madeAt.desc()),
    uniqueIndex('quote_documents_blob_uq').on(t.blobKey),
    uniqueIndex('quote_documents_edition_uq').on(t.quoteId, t.edition),
    check('quote_documents_edition_positive', sql`${t.edition} >= 1`),
    check('quote_documents_sha256', sql`${t.sha256} ~ '^[0-9a-f]{64}$'`),
    check('quote_documents_blob_namespaced', sql`${t.blobKey} like 'accounts/' || ${t.accountId}::text || '/%'`),
  ],
);

export type Quote = typeof quotes.$inferSelect;
export type QuoteItem = typeof quoteItems.$inferSelect;
export type QuoteDocument = typeof quoteDocuments.$inferSelect;

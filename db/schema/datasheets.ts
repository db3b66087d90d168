import { sql } from 'drizzle-orm';
import {
  check,
  customType,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { sizings } from './sizings';
import { users } from './users';

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'bytea' });

export const datasheets = pgTable(
  'datasheets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    number: text('number').notNull(),
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'restrict' }),
    sizingId: uuid('sizing_id')
      .notNull()
      .references(() => sizings.id, { onDelete: 'restrict' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('datasheets_number_uq').on(t.number),
    // Number prefixes typed into the look-up (`DS26-05`), under any collation.
    index('datasheets_number_pattern_idx').on(sql`${t.number} text_pattern_ops`),
    uniqueIndex('datasheets_sizing_uq').on(t.sizingId),
    index('datasheets_account_idx').on(t.accountId),
  ],
);

/** Issued revisions are immutable: a trigger in the migrations refuses UPDATE and DELETE. */
export const datasheetRevisions = pgTable(
  'datasheet_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    datasheetId: uuid('datasheet_id')
      .notNull()
      .references(() => datasheets.id, { onDelete: 'restrict' }),
    revision: text('revision').notNull(),
    snapshot: jsonb('snapshot').notNull(),
    blobKey: text('blob_key').notNull(),
    sha256: text('sha256').notNull(),
    byteSize: integer('byte_size').notNull(),
    note: text('note'),
    issuedByUserId: uuid('issued_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    issuedAt: timestamp('issued_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('datasheet_revisions_uq').on(t.datasheetId, t.revision),
    uniqueIndex('datasheet_revisions_blob_uq').on(t.blobKey),
    check('datasheet_revisions_sha256', sql`${t.sha256} ~ '^[0-9a-f]{64}$'`),
    check('datasheet_revisions_letter', sql`${t.revision} ~ '^[A-Z]{1,2}$'`),
  ],
);

/** The PostgreSQL blob store; keys are namespaced by account (`accounts/<id>/...`). */
export const blobs = pgTable(
  'blobs',
  {
    key: text('key').primaryKey(),
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'restrict' }),
    contentType: text('content_type').notNull(),
    byteSize: integer('byte_size').notNull(),
    sha256: text('sha256').notNull(),
    data: bytea('data').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('blobs_account_idx').on(t.accountId),
    check('blobs_key_namespaced', sql`${t.key} like 'accounts/' || ${t.accountId}::text || '/%'`),
  ],
);

export const uploads = pgTable(
  'uploads',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'restrict' }),
    uploadedByUserId: uuid('uploaded_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    fileName: text('file_name').notNull(),
    contentType: text('content_type').notNull(),
    byteSize: integer('byte_size').notNull(),
    blobKey: text('blob_key').notNull(),
    rowCount: integer('row_count').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('uploads_account_idx').on(t.accountId, t.createdAt.desc()),
    check('uploads_size_limit', sql`${t.byteSize} between 1 and 5242880`),
  ],
);

export type Datasheet = typeof datasheets.$inferSelect;
export type DatasheetRevision = typeof datasheetRevisions.$inferSelect;
export type Upload = typeof uploads.$inferSelect;

import { sql } from 'drizzle-orm';
import {
  check,
  customType,
  doublePrecision,
  index,
  integer,
  json,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { service } from './enums';
import { users } from './users';

const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });

/**
 * One saved duty point. `input` is the validated engine request and `result` the engine's answer
 * at save time; the scalar columns beside them exist so support search and filters use indexes.
 */
export const sizings = pgTable(
  'sizings',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    number: text('number').notNull(),
    accountId: uuid('account_id')
      .notNull()
      .references(() => accounts.id, { onDelete: 'restrict' }),
    title: text('title').notNull(),
    equipmentTag: text('equipment_tag'),
    notes: text('notes'),
    service: service('service').notNull(),
    gasKey: text('gas_key').notNull(),
    gasLabel: text('gas_label').notNull(),
    // json, not jsonb: it keeps keys in the order given, so a mixture reads back in the order it was entered.
    input: json('input').notNull(),
    result: jsonb('result').notNull(),
    engineVersion: text('engine_version').notNull(),
    // Design duty for heaters, shaft power for compressors.
    headlineKw: doublePrecision('headline_kw').notNull(),
    massFlowKgPerS: doublePrecision('mass_flow_kg_per_s').notNull(),
    // The current version of the record; earlier versions are kept in sizing_versions.
    revision: integer('revision').notNull().default(1),
    createdByUserId: uuid('created_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    // Who saved the current version (the creator until the sizing is first revised).
    updatedByUserId: uuid('updated_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    // Title and notes as text-search words, unstemmed so a typed prefix finds the word; titles rank above notes.
    searchVector: tsvector('search_vector').generatedAlwaysAs(
      sql`setweight(to_tsvector('simple', coalesce(title, '')), 'A') || setweight(to_tsvector('simple', coalesce(notes, '')), 'C')`,
    ),
  },
  (t) => [
    uniqueIndex('sizings_number_uq').on(t.number),
    // The look-up pages by keyset: every sort key is indexed together with the id that breaks its ties.
    index('sizings_created_id_idx').on(t.createdAt, t.id),
    index('sizings_headline_id_idx').on(t.headlineKw, t.id),
    index('sizings_account_created_id_idx').on(t.accountId, t.createdAt, t.id),
    // Prefix look-ups (`S26-01%`, `eh-4%`) under any collation, and equality on the lower-case tag.
    index('sizings_number_pattern_idx').on(sql`${t.number} text_pattern_ops`),
    index('sizings_tag_pattern_idx').on(sql`lower(${t.equipmentTag}) text_pattern_ops`),
    // A tag typed in part: trigram substring match.
    index('sizings_tag_trgm_idx').using('gin', sql`lower(${t.equipmentTag}) gin_trgm_ops`),
    index('sizings_search_vector_idx').using('gin', t.searchVector),
    index('sizings_service_gas_idx').on(t.service, t.gasKey),
    index('sizings_creator_idx').on(t.createdByUserId),
    check('sizings_headline_finite', sql`${t.headlineKw} >= 0 and ${t.headlineKw} < 'Infinity'::float8`),
    check('sizings_mass_flow_positive', sql`${t.massFlowKgPerS} > 0 and ${t.massFlowKgPerS} < 'Infinity'::float8`),
    check('sizings_revision_positive', sql`${t.revision} >= 1`),
  ],
);

/**
 * An earlier version of a sizing, copied here when the sizing is revised: the record keeps its number
 * and id (and so its datasheet), and the versions show what changed.
 */
export const sizingVersions = pgTable(
  'sizing_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    sizingId: uuid('sizing_id')
      .notNull()
      .references(() => sizings.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    title: text('title').notNull(),
    equipmentTag: text('equipment_tag'),
    notes: text('notes'),
    gasLabel: text('gas_label').notNull(),
    input: json('input').notNull(),
    result: jsonb('result').notNull(),
    engineVersion: text('engine_version').notNull(),
    headlineKw: doublePrecision('headline_kw').notNull(),
    massFlowKgPerS: doublePrecision('mass_flow_kg_per_s').notNull(),
    createdByUserId: uuid('created_by_user_id').references(() => users.id, { onDelete: 'set null' }),
    // When this version was saved (the sizing's updated_at at the time it was superseded).
    savedAt: timestamp('saved_at', { withTimezone: true }).notNull(),
    supersededAt: timestamp('superseded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('sizing_versions_uq').on(t.sizingId, t.version),
    check('sizing_versions_version_positive', sql`${t.version} >= 1`),
  ],
);

export type Sizing = typeof sizings.$inferSelect;
export type SizingVersion = typeof sizingVersions.$inferSelect;
export type NewSizing = typeof sizings.$inferInsert;

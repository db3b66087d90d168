import { sql, type SQL } from 'drizzle-orm';
import type { SupportSearch } from './schema';

/**
 * Keyset paging: a page continues after the last row of the previous one, named by its sort key and id,
 * so page 400 costs what page 1 costs. Every sort key has an index ending in the id (see db/schema/sizings.ts).
 */
export type SortSpec = {
  /** The sort key as a column of `s` (sizings). */
  key: SQL;
  /** The same key as text, exact enough to continue from (microseconds, every float digit). */
  keyText: SQL;
  /** How a key read back from a cursor is cast. */
  cast: SQL;
  desc: boolean;
  /** What a cursor's key must look like before it reaches SQL. */
  valid: (k: string) => boolean;
};

const TIMESTAMP = /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}(\.\d{1,6})?[+-]\d{2}(:\d{2})?$/;
const created = {
  key: sql`s.created_at`,
  keyText: sql`s.created_at::text`,
  cast: sql`timestamptz`,
  valid: (k: string) => TIMESTAMP.test(k),
};
const headline = {
  key: sql`s.headline_kw`,
  keyText: sql`s.headline_kw::text`,
  cast: sql`float8`,
  valid: (k: string) => k.length < 40 && Number.isFinite(Number(k)),
};

export type KeyedSort = Exclude<NonNullable<SupportSearch['sort']>, 'relevance'>;

export const SORTS: Record<KeyedSort, SortSpec> = {
  newest: { ...created, desc: true },
  oldest: { ...created, desc: false },
  largest: { ...headline, desc: true },
  smallest: { ...headline, desc: false },
};

/** Where a page starts: after a row (keyed sorts) or at an offset (relevance); `close` keeps close spellings on. */
export type Cursor = { after?: { key: string; id: string }; offset?: number; close?: boolean };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export function encodeCursor(c: Cursor): string {
  return Buffer.from(JSON.stringify(c)).toString('base64url');
}

/** The cursor, or an empty one (the first page) when it is missing, damaged or made for another sort. */
export function decodeCursor(raw: string | undefined, sort: SortSpec | null): Cursor {
  if (!raw) return {};
  try {
    const c = JSON.parse(Buffer.from(raw, 'base64url').toString('utf8')) as Cursor;
    const close = c.close === true;
    if (!sort)
      return Number.isInteger(c.offset) && c.offset! >= 0 && c.offset! <= 10_000 ? { offset: c.offset, close } : {};
    const a = c.after;
    if (a && typeof a.key === 'string' && sort.valid(a.key) && typeof a.id === 'string' && UUID.test(a.id))
      return { after: { key: a.key, id: a.id }, close };
  } catch {
    // fall through: an unreadable cursor starts from the beginning
  }
  return {};
}

/** The row-comparison condition that continues after the cursor's row, or nothing on the first page. */
export function afterCondition(sort: SortSpec, cursor: Cursor): SQL | null {
  if (!cursor.after) return null;
  const op = sort.desc ? sql`<` : sql`>`;
  return sql`(${sort.key}, s.id) ${op} (${cursor.after.key}::${sort.cast}, ${cursor.after.id}::uuid)`;
}

/** ORDER BY for a keyed sort, over the sizings alias `s` or over a derived table `alias` with `k` and `id`. */
export function orderOf(sort: SortSpec, alias?: 'u' | 'h' | 'x' | 'w' | 'm'): SQL {
  const dir = sort.desc ? sql`desc` : sql`asc`;
  return alias ? sql`${sql.raw(alias)}.k ${dir}, ${sql.raw(alias)}.id ${dir}` : sql`${sort.key} ${dir}, s.id ${dir}`;
}

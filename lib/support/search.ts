import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import { db, type Queryable } from '@/db';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountScope } from '@/lib/auth/guards';
import { closeBranches, exactBranches, type Branch } from './branches';
import { countMatches } from './count';
import { customersNamedSql } from './customers';
import { filterConditions } from './filters';
import { afterCondition, decodeCursor, encodeCursor, SORTS, type Cursor, type SortSpec } from './keyset';
import { closeTagsSql, textQueryFrom, wordChoices, type WordChoice } from './lexicon';
import { keyedPage, RELEVANCE_POOL, relevancePage, type SupportHit } from './page-query';
import type { SupportSearch } from './schema';
import { parseLookupText, type LookupTerms } from './terms';
import { textMatches } from './text-walk';
import { effectiveSort, paddedDocumentNumber } from './numbers';
import { lookupScope } from './scope';

export type { SupportHit } from './page-query';

export type SupportResults = {
  hits: SupportHit[];
  /** Exact when `totalIsEstimate` is false; otherwise PostgreSQL's estimate, to be shown as "about N". */
  total: number;
  totalIsEstimate: boolean;
  /** Close spellings were added because the text as typed matched almost nothing. */
  closeMatches: boolean;
  /** Pass as `cursor` for the next page; null on the last page. */
  nextCursor: string | null;
  page: number;
  pageSize: number;
};

// Fewer hits than this for the text as typed and the look-up also tries close spellings.
const CLOSE_BELOW = 5;

type Plan = {
  branches: Branch[] | null;
  filters: SQL[];
  sort: SortSpec | null;
  cursor: Cursor;
  close: boolean;
  tableRows: number;
  /** A floor for the total: the share of the text matches in the window read, scaled to the table. */
  floor: number;
};

/** The branches for the text as typed; its words and its customers are looked up in one round trip. */
async function exactMatches(terms: LookupTerms): Promise<Branch[]> {
  const words = wordChoices(terms);
  const res = await db.execute<{ words: WordChoice[] | null; customers: string[] }>(sql`
    select ${words ? sql`(select json_agg(c) from (${words}) c)` : sql`null::json`} as words,
      array(${customersNamedSql(terms.text, false)}) as customers`);
  const row = res.rows[0]!;
  return exactBranches(terms, row.words ? textQueryFrom(terms, row.words) : null, row.customers);
}

/** The branches for close spellings: the nearest tags in use and the customers, in one round trip. */
async function closeMatches(terms: LookupTerms): Promise<Branch[]> {
  const res = await db.execute<{ tags: string[]; customers: string[] }>(sql`
    select (${closeTagsSql(terms.text)}) as tags, array(${customersNamedSql(terms.text, true)}) as customers`);
  const row = res.rows[0]!;
  return closeBranches(terms, row.tags, row.customers);
}

// The planner's row count of sizings sizes the text walk's windows and scales "about N"; it moves slowly, so
// one read a minute serves every look-up.
const TABLE_ROWS_FOR_MS = 60_000;
let tableRowsRead: { rows: number; at: number } | null = null;
async function sizingsRowEstimate(conn: Queryable): Promise<number> {
  if (tableRowsRead && Date.now() - tableRowsRead.at < TABLE_ROWS_FOR_MS) return tableRowsRead.rows;
  const res = await conn.execute<{ rows: number }>(
    sql`select greatest(reltuples, 0)::float8 as rows from pg_class where oid = 'sizings'::regclass`,
  );
  tableRowsRead = { rows: res.rows[0]?.rows ?? 0, at: Date.now() };
  return tableRowsRead.rows;
}

async function fetchRows(conn: Queryable, p: Plan, limit: number) {
  const sort = p.sort ?? SORTS.newest;
  for (const b of p.branches ?? []) {
    if (!b.textQuery || b.ids) continue;
    const want = p.sort ? limit : RELEVANCE_POOL;
    const after = p.sort ? afterCondition(sort, p.cursor) : null;
    const m = await textMatches(conn, b.textQuery, p.filters, sort, after, want, p.tableRows);
    b.ids = m.ids;
    if (m.density !== null) p.floor = Math.max(p.floor, m.density * p.tableRows);
  }
  if (p.sort) return keyedPage(conn, p.branches, p.filters, p.sort, p.cursor, limit);
  return relevancePage(conn, p.branches ?? [], p.filters, p.cursor.offset ?? 0, limit);
}

/**
 * One page of the sizings matching the look-up, in the chosen order, with a total that is exact up to a
 * thousand and estimated above. The text is matched as a document number, a tag, title and notes words,
 * a customer and a quote title, each through its own index; when that finds almost nothing, close
 * spellings of tags and customers are tried as well. Scoped by `accountScope(user)`.
 */
export async function searchSizings(user: CurrentUser, f: SupportSearch): Promise<SupportResults> {
  // Read-only, so no transaction: each statement reads its own snapshot, and the page and its count may
  // differ by a sizing saved in between. The session settings it relies on (trigram floors, no JIT) are the
  // connection's own (db/index.ts).
  // No sort chosen: best match while text is typed, newest otherwise. A short document number ("DS26-501")
  // is looked up as its padded form.
  const chosen = effectiveSort(f.sort, f.q);
  const sort = chosen === 'relevance' ? (f.q ? null : SORTS.newest) : SORTS[chosen];
  if (f.q) f = { ...f, q: paddedDocumentNumber(f.q) ?? f.q };
  const cursor = decodeCursor(f.cursor, sort);
  const first = !cursor.after && !cursor.offset;
  const filters = filterConditions(accountScope(user), f);
  // Sales engineers look across their own customers only.
  const mine = lookupScope(user);
  if (mine) filters.push(mine);
  const terms = f.q ? parseLookupText(f.q) : null;
  const tableRows = terms?.words.length ? await sizingsRowEstimate(db) : 0;
  const p: Plan = { branches: null, filters, sort, cursor, close: false, tableRows, floor: 0 };
  if (terms) {
    p.close = cursor.close === true;
    p.branches = await exactMatches(terms);
    if (p.close) p.branches.push(...(await closeMatches(terms)));
  }
  let rows = await fetchRows(db, p, f.pageSize + 1);
  // Close spellings when the text as typed found almost nothing; a document number that found its record
  // is an answer, not a near miss.
  const numberFound = terms?.numberPrefix && rows.length > 0;
  if (terms && first && !p.close && !numberFound && rows.length < CLOSE_BELOW && terms.text.length >= 3) {
    p.close = true;
    p.branches = [...(p.branches ?? []), ...(await closeMatches(terms))];
    rows = await fetchRows(db, p, f.pageSize + 1);
  }
  const more = rows.length > f.pageSize;
  const page = rows.slice(0, f.pageSize);
  const last = page.at(-1);
  const next: Cursor | null =
    !more || !last
      ? null
      : sort
        ? { after: { key: last.sortKey, id: last.hit.id }, close: p.close }
        : { offset: (cursor.offset ?? 0) + f.pageSize, close: p.close };
  const count =
    first && !more ? { total: page.length, estimated: false } : await countMatches(db, p.branches, p.filters, p.floor);
  return {
    hits: page.map((r) => r.hit),
    total: count.total,
    totalIsEstimate: count.estimated,
    closeMatches: p.close,
    nextCursor: next ? encodeCursor(next) : null,
    page: f.page,
    pageSize: f.pageSize,
  };
}

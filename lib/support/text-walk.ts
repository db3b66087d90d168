import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '@/db';
import { allOf } from './filters';
import { orderOf, type SortSpec } from './keyset';

export type TextMatches = {
  /** The first `want` matching ids in the sort order. */
  ids: string[];
  /** Matches per sizing in the window read first: scaled to the table, a floor for the count estimate. */
  density: number | null;
};

/** How many of the newest sizings (in the sort order) are read before falling back to the text index. */
export function windowSize(tableRows: number, want: number): number {
  return Math.round(Math.min(50_000, Math.max(2_000, want * 20, tableRows / 250)));
}

/** Rows the next window walks: enough, at the density seen, for the matches still missing (half as many again). */
export function nextWindowSize(missing: number, density: number): number {
  return Math.max(500, Math.ceil((missing / density) * 1.5));
}

/** Rows all windows together may read before the text index is asked instead: about a tenth of a second. */
export function walkBudget(firstWindow: number): number {
  return Math.max(120_000, 6 * firstWindow);
}

// A text that could match at least this many sizings is common: when the newest rows hold none of it (a
// recent stretch of other work), later windows will find it. Rarer text is asked of the index at once.
const COMMON_TEXT_ROWS = 2_000;

type Walk = { examined: number; found: number; ids: string[]; lastKey: string; lastId: string };

/**
 * Reads `rows` sizings in sort order after `after` and tests each against the text and filters, in one pass
 * over them: the rows arrive in index order and are numbered as they come, so nothing is sorted again but
 * the hits that are kept.
 */
async function walk(
  conn: Queryable,
  q: SQL,
  filters: SQL[],
  sort: SortSpec,
  after: SQL | null,
  rows: number,
  want: number,
) {
  const res = await conn.execute<Walk>(sql`
    with w as (
      select s.id, ${sort.key} as k, (s.search_vector @@ ${q} and ${allOf(filters)}) as hit,
        row_number() over (order by ${orderOf(sort)}) as rn
      from sizings s where ${allOf([after])} order by ${orderOf(sort)} limit ${rows})
    select count(*)::int as examined, count(*) filter (where hit)::int as found,
      coalesce((array_agg(id order by rn) filter (where hit))[1:${want}], '{}') as ids,
      max(k::text) filter (where rn = ${rows}) as "lastKey", max(id::text) filter (where rn = ${rows}) as "lastId"
    from w`);
  return res.rows[0]!;
}

const pastRow = (sort: SortSpec, w: Walk) =>
  sql`(${sort.key}, s.id) ${sort.desc ? sql`<` : sql`>`} (${w.lastKey}::${sort.cast}, ${w.lastId}::uuid)`;

/**
 * The most sizings the text could match: the planner's count for its rarest part (the parts of "a & (b | c)"
 * are each estimated from the column's word statistics). The estimate of the whole would multiply the parts'
 * frequencies as if the words were unrelated, and "stainless & sheath" would look rare.
 */
async function mostMatches(conn: Queryable, textQuery: string, filters: SQL[]): Promise<number> {
  let least = Infinity;
  for (const part of textQuery.split(' & ')) {
    const plan = await conn.execute<{ 'QUERY PLAN': [{ Plan: { 'Plan Rows': number } }] }>(
      sql`explain (format json) select 1 from sizings s
        where ${allOf([sql`s.search_vector @@ to_tsquery('simple', ${part})`, ...filters])}`,
    );
    least = Math.min(least, plan.rows[0]?.['QUERY PLAN'][0].Plan['Plan Rows'] ?? 0);
    if (least < COMMON_TEXT_ROWS) break;
  }
  return least;
}

/**
 * The first `want` sizings whose title or notes match `textQuery`, in the sort order, after `after`.
 * PostgreSQL estimates "stainless & sheath" as if the two words were unrelated and, believing it rare, reads
 * all forty thousand matches through the text index to sort them. So the look-up reads bounded windows of
 * sizings in sort order and tests each: the first sized from the table, each next one from the matches per
 * row seen so far (four times the last while none was seen, if the text is common at all), within a budget
 * of rows. Only rare text, or text the budget did not reach, is asked of the text index for the matches
 * beyond, and then there are few of them.
 */
export async function textMatches(
  conn: Queryable,
  textQuery: string,
  filters: SQL[],
  sort: SortSpec,
  after: SQL | null,
  want: number,
  tableRows: number,
): Promise<TextMatches> {
  const q = sql`to_tsquery('simple', ${textQuery})`;
  let rows = windowSize(tableRows, want);
  const budget = walkBudget(rows);
  const ids: string[] = [];
  let [examined, found] = [0, 0];
  let last: Walk | null = null;
  let common: boolean | null = null;
  for (;;) {
    const w: Walk = await walk(
      conn,
      q,
      filters,
      sort,
      allOf([after, last && pastRow(sort, last)]),
      rows,
      want - ids.length,
    );
    ids.push(...w.ids);
    [examined, found] = [examined + w.examined, found + w.found];
    const density = found / examined;
    if (ids.length >= want || w.examined < rows) return { ids, density: examined ? density : null };
    last = w;
    const left = budget - examined;
    if (found > 0) {
      rows = nextWindowSize(want - ids.length, density);
      if (rows > left) break;
    } else {
      common ??= (await mostMatches(conn, textQuery, filters)) >= COMMON_TEXT_ROWS;
      if (!common || left <= 0) break;
      rows = Math.min(rows * 4, left);
    }
  }
  // Beyond the windows: every remaining match, found through the text index (and any filter index).
  const rest = await conn.execute<{ id: string }>(sql`
    with m as materialized (
      select s.id, ${sort.key} as k from sizings s
      where ${allOf([sql`s.search_vector @@ ${q}`, ...filters, after, pastRow(sort, last)])})
    select id from m order by ${orderOf(sort, 'm')} limit ${want - ids.length}`);
  return { ids: [...ids, ...rest.rows.map((x) => x.id)], density: found / examined };
}

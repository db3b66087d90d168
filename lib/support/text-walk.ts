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

/** Rows a second window walks: enough, at the density seen, for the matches still missing (half as many again). */
const MAX_SECOND_WINDOW = 60_000;
export function secondWindowSize(missing: number, density: number): number | null {
  if (density <= 0) return null;
  const rows = Math.ceil((missing / density) * 1.5);
  return rows <= MAX_SECOND_WINDOW ? Math.max(rows, 500) : null;
}

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
 * The first `want` sizings whose title or notes match `textQuery`, in the sort order, after `after`.
 * PostgreSQL estimates "stainless & sheath" as if the two words were unrelated and, believing it rare, reads
 * all forty thousand matches through the text index to sort them. So the look-up first reads a bounded
 * window of sizings in sort order and tests each; when that holds too few, a second window sized from the
 * matches per row just seen usually finds the rest; only for rare text (or a second window that falls short)
 * does it ask the text index for the matches beyond, and then there are few of them. The work stays bounded.
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
  const windowRows = windowSize(tableRows, want);
  const first = await walk(conn, q, filters, sort, after, windowRows, want);
  const density = first.examined ? first.found / first.examined : null;
  if (first.found >= want || first.examined < windowRows) return { ids: first.ids, density };
  let ids = first.ids;
  let last = first;
  const second = secondWindowSize(want - first.found, density ?? 0);
  if (second !== null) {
    const more = await walk(conn, q, filters, sort, allOf([after, pastRow(sort, first)]), second, want - first.found);
    ids = [...ids, ...more.ids];
    if (ids.length >= want || more.examined < second) return { ids, density };
    last = more;
  }
  // Beyond the windows: every remaining match, found through the text index (and any filter index).
  const rest = await conn.execute<{ id: string }>(sql`
    with m as materialized (
      select s.id, ${sort.key} as k from sizings s
      where ${allOf([sql`s.search_vector @@ ${q}`, ...filters, after, pastRow(sort, last)])})
    select id from m order by ${orderOf(sort, 'm')} limit ${want - ids.length}`);
  return { ids: [...ids, ...rest.rows.map((x) => x.id)], density };
}

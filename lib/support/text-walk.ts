import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import type { Tx } from '@/db';
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

/**
 * The first `want` sizings whose title or notes match `textQuery`, in the sort order, after `after`.
 * PostgreSQL estimates "stainless & sheath" as if the two words were unrelated and, believing it rare, reads
 * all forty thousand matches through the text index to sort them. So the look-up first reads a bounded
 * window of sizings in sort order and tests each; only when that window holds too few does it ask the text
 * index for the matches beyond it, and then there are few of them. Either way the work stays bounded.
 */
export async function textMatches(
  tx: Tx,
  textQuery: string,
  filters: SQL[],
  sort: SortSpec,
  after: SQL | null,
  want: number,
  tableRows: number,
): Promise<TextMatches> {
  const q = sql`to_tsquery('simple', ${textQuery})`;
  const windowRows = windowSize(tableRows, want);
  const res = await tx.execute<{ examined: number; found: number; ids: string[]; lastKey: string; lastId: string }>(sql`
    with w as (
      select s.id, ${sort.key} as k, ${sort.keyText} as key_text, (s.search_vector @@ ${q} and ${allOf(filters)}) as hit
      from sizings s where ${allOf([after])} order by ${orderOf(sort)} limit ${windowRows})
    select (select count(*) from w)::int as examined, (select count(*) from w where hit)::int as found,
      array(select id from w where hit order by ${orderOf(sort, 'w')} limit ${want}) as ids,
      (select key_text from w order by ${orderOf(sort, 'w')} offset ${windowRows - 1} limit 1) as "lastKey",
      (select id from w order by ${orderOf(sort, 'w')} offset ${windowRows - 1} limit 1) as "lastId"`);
  const r = res.rows[0]!;
  const density = r.examined ? r.found / r.examined : null;
  if (r.found >= want || r.examined < windowRows) return { ids: r.ids, density };
  // Beyond the window: every remaining match, found through the text index (and any filter index).
  const beyond = sql`(${sort.key}, s.id) ${sort.desc ? sql`<` : sql`>`} (${r.lastKey}::${sort.cast}, ${r.lastId}::uuid)`;
  const rest = await tx.execute<{ id: string }>(sql`
    with m as materialized (
      select s.id, ${sort.key} as k from sizings s where ${allOf([sql`s.search_vector @@ ${q}`, ...filters, after, beyond])})
    select id from m order by ${orderOf(sort, 'm')} limit ${want - r.found}`);
  return { ids: [...r.ids, ...rest.rows.map((x) => x.id)], density };
}

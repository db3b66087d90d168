import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '@/db';
import type { Branch } from './branches';
import { allOf, idArray } from './filters';
import { afterCondition, orderOf, type Cursor, type SortSpec } from './keyset';

/** A row of the look-up as the screen and the export show it. */
export type SupportHit = {
  id: string;
  number: string;
  title: string;
  equipmentTag: string | null;
  service: 'heater' | 'compressor';
  gasLabel: string;
  headlineKw: number;
  accountId: string;
  accountName: string;
  createdAt: string;
  createdByName: string | null;
  datasheetNumber: string | null;
  quoteNumbers: string[];
};

// Relevance ranks at most this many of the newest matches of each branch: ranking every one of sixty
// thousand matches of a common word would cost seconds, and the best answers to a typed query are rarely old.
// Four pages' worth: finding the newest matches of a common misspelt word is most of a look-up's work, and
// 200 cost twice what 100 does for the same first page.
export const RELEVANCE_POOL = 100;

const columns = sql`s.id, s.number, s.title, s.equipment_tag as "equipmentTag", s.service, s.gas_label as "gasLabel",
  s.headline_kw as "headlineKw", s.account_id as "accountId", a.name as "accountName",
  to_char(s.created_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS"Z"') as "createdAt", u.name as "createdByName",
  (select d.number from datasheets d where d.sizing_id = s.id) as "datasheetNumber",
  coalesce((select array_agg(q.number order by q.number) from quote_items qi join quotes q on q.id = qi.quote_id
    where qi.sizing_id = s.id), '{}') as "quoteNumbers"`;
const joins = sql`join sizings s on s.id = h.id join accounts a on a.id = s.account_id
  left join users u on u.id = s.created_by_user_id`;

type Row = SupportHit & { sortKey: string };

/** A hit and the text of its sort key, from which the next page's cursor is made. */
export type PageRow = { hit: SupportHit; sortKey: string };

const split = (rows: Row[]): PageRow[] => rows.map(({ sortKey, ...hit }) => ({ hit, sortKey }));

const perAccount = (ids: string[]) => sql`unnest(${idArray(ids)}) as acct(id)`;

/**
 * Up to `limit` rows in a keyed sort after the cursor. Each branch finds its own first `limit` rows through
 * its own index; the union of those holds the overall first `limit`. No text (`branches` null): filters only.
 */
export async function keyedPage(
  conn: Queryable,
  branches: Branch[] | null,
  filters: SQL[],
  sort: SortSpec,
  cursor: Cursor,
  limit: number,
): Promise<PageRow[]> {
  const after = afterCondition(sort, cursor);
  const one = (b: Branch | null) => {
    const own = (match: SQL | null) =>
      sql`select s.id, ${sort.key} as k from sizings s where ${allOf([match, ...filters, after])}
        order by ${orderOf(sort)} limit ${limit}`;
    if (b?.ids) return sql`(${own(sql`s.id = any(${idArray(b.ids)})`)})`;
    if (!b?.accountIds) return sql`(${own(b?.where ?? null)})`;
    // Customer by customer, each through (account_id, created_at, id), then the best of those.
    return sql`(select x.id, x.k from ${perAccount(b.accountIds)}
      cross join lateral (${own(sql`s.account_id = acct.id`)}) x order by ${orderOf(sort, 'x')} limit ${limit})`;
  };
  const hits = branches
    ? sql`select id, k from (${sql.join(branches.map(one), sql` union `)}) u order by ${orderOf(sort, 'u')} limit ${limit}`
    : one(null);
  const res = await conn.execute<Row>(sql`with h as (${hits})
    select ${columns}, ${sort.keyText} as "sortKey" from h ${joins} order by ${orderOf(sort, 'h')}`);
  return split(res.rows);
}

/** Up to `limit` rows from `offset` in relevance order: each branch's newest matches, scored, best first. */
export async function relevancePage(
  conn: Queryable,
  branches: Branch[],
  filters: SQL[],
  offset: number,
  limit: number,
): Promise<PageRow[]> {
  const pool = (b: Branch, match: SQL) =>
    sql`select s.id, s.created_at, ${b.score} as score from sizings s where ${allOf([match, ...filters])}
      order by s.created_at desc, s.id desc limit ${RELEVANCE_POOL}`;
  const pools = branches.map((b) =>
    b.ids
      ? sql`(${pool(b, sql`s.id = any(${idArray(b.ids)})`)})`
      : b.accountIds
        ? sql`(select x.* from ${perAccount(b.accountIds)} cross join lateral (${pool(b, sql`s.account_id = acct.id`)}) x
          order by x.created_at desc, x.id desc limit ${RELEVANCE_POOL})`
        : sql`(${pool(b, b.where)})`,
  );
  const res = await conn.execute<Row>(sql`with h as (
      select id, max(score) as score, max(created_at) as created_at from (${sql.join(pools, sql` union all `)}) p
      group by id order by score desc, created_at desc, id desc limit ${limit} offset ${offset})
    select ${columns}, '' as "sortKey" from h ${joins} order by h.score desc, h.created_at desc, h.id desc`);
  return split(res.rows);
}

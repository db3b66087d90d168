import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountScope } from '@/lib/auth/guards';
import { effectiveSort, paddedDocumentNumber } from './numbers';
import type { SupportSearch } from './schema';
import { lookupScope } from './scope';

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

export type SupportResults = {
  hits: SupportHit[];
  total: number;
  totalIsEstimate: boolean;
  page: number;
  pageSize: number;
};

const COUNT_CAP = 1_000;

function escapeLike(s: string): string {
  return s.replace(/[%_\\]/g, (c) => `\\${c}`);
}

/**
 * Text match over sizings, their account, datasheet and quote numbers. The precise form (substring and
 * number prefix) runs first; only when it finds almost nothing is the typo-tolerant form used, which
 * compares the query with the short fields (tag, title, customer, quote title) by trigram similarity.
 * Each branch is its own SELECT in a union so it uses its own index: OR-ing them makes PostgreSQL scan
 * every sizing.
 */
function matchingIds(q: string, fuzzy: boolean): SQL {
  const lower = q.toLowerCase();
  const like = `%${escapeLike(lower)}%`;
  const prefix = `${escapeLike(q.toUpperCase())}%`;
  const padded = paddedDocumentNumber(q);
  const exact = padded
    ? sql`
    union select d.sizing_id from datasheets d where d.number = ${padded}
    union select qi.sizing_id from quote_items qi join quotes q4 on q4.id = qi.quote_id where q4.number = ${padded}
    union select t.id from sizings t where t.number = ${padded}`
    : sql``;
  const typo = fuzzy
    ? sql`
    union select t.id from sizings t where lower(t.equipment_tag) % ${lower}
    union select t.id from sizings t where ${lower} <% lower(t.title)
    union select t.id from sizings t where t.account_id in (select a3.id from accounts a3 where ${lower} <% lower(a3.name))
    union select qi.sizing_id from quote_items qi join quotes q3 on q3.id = qi.quote_id where ${lower} <% lower(q3.title)`
    : sql``;
  return sql`
    select t.id from sizings t where t.search_text like ${like}
    union select t.id from sizings t where t.account_id in (select a2.id from accounts a2 where a2.name ilike ${like})
    union select d.sizing_id from datasheets d where d.number like ${prefix}
    union select qi.sizing_id from quote_items qi join quotes q2 on q2.id = qi.quote_id where q2.number like ${prefix} or lower(q2.title) like ${like}
    ${exact}
    ${typo}`;
}

function conditions(user: CurrentUser, f: SupportSearch, fuzzy: boolean): SQL[] {
  const c: SQL[] = [];
  const scope = accountScope(user);
  if (scope) c.push(sql`s.account_id = ${scope}`);
  const mine = lookupScope(user);
  if (mine) c.push(mine);
  if (f.accountId) c.push(sql`s.account_id = ${f.accountId}`);
  if (f.q) c.push(sql`s.id in (${matchingIds(f.q, fuzzy)})`);
  if (f.service) c.push(sql`s.service = ${f.service}`);
  if (f.gas) c.push(sql`s.gas_key = ${f.gas}`);
  if (f.minKw !== undefined) c.push(sql`s.headline_kw >= ${f.minKw}`);
  if (f.maxKw !== undefined) c.push(sql`s.headline_kw <= ${f.maxKw}`);
  if (f.from) c.push(sql`s.created_at >= ${f.from}::date`);
  if (f.to) c.push(sql`s.created_at < (${f.to}::date + 1)`);
  if (f.creator) c.push(sql`s.created_by_user_id = ${f.creator}`);
  if (f.quoteStatus)
    c.push(
      sql`s.id in (select qi.sizing_id from quote_items qi join quotes q3 on q3.id = qi.quote_id where q3.status = ${f.quoteStatus})`,
    );
  return c;
}

/** Best match first: the document typed exactly, then the closest words in the sizing or its customer's name. */
function relevance(q: string): SQL {
  const number = paddedDocumentNumber(q) ?? q.trim().toUpperCase();
  const lower = q.toLowerCase();
  return sql`(case when s.number = ${number} or exists (select 1 from datasheets d where d.sizing_id = s.id and d.number = ${number}) then 2 else 0 end)
    + greatest(word_similarity(${lower}, s.search_text), word_similarity(${lower}, lower(a.name))) desc, s.created_at desc, s.id`;
}

function orderBy(f: SupportSearch): SQL {
  switch (effectiveSort(f.sort, f.q)) {
    case 'oldest':
      return sql`s.created_at asc, s.id`;
    case 'largest':
      return sql`s.headline_kw desc, s.id`;
    case 'smallest':
      return sql`s.headline_kw asc, s.id`;
    case 'relevance':
      return f.q ? relevance(f.q) : sql`s.created_at desc, s.id`;
    default:
      return sql`s.created_at desc, s.id`;
  }
}

/** One page of matching sizings with the numbers support is asked about, plus a (capped) total. */
const whereOf = (conds: SQL[]) => (conds.length ? sql`where ${sql.join(conds, sql` and `)}` : sql``);
// Fewer precise hits than this and the look-up also tries close spellings.
const FUZZY_BELOW = 5;

export async function searchSizings(user: CurrentUser, f: SupportSearch): Promise<SupportResults> {
  const offset = (f.page - 1) * f.pageSize;
  return db.transaction(async (tx) => {
    // Looser trigram thresholds than the defaults (0.3 / 0.6) so one or two wrong characters in a tag still
    // match; no JIT, which costs short interactive queries more than it saves. One round trip for all three.
    await tx.execute(sql`select set_config('pg_trgm.similarity_threshold', '0.4', true),
      set_config('pg_trgm.word_similarity_threshold', '0.5', true), set_config('jit', 'off', true)`);
    const count = async (conds: SQL[], fuzzy: boolean) => {
      // A text query alone: its id set is the answer, so count it without probing every sizing it names.
      const from =
        f.q && conds.length === 1
          ? sql`(${matchingIds(f.q, fuzzy)} limit ${COUNT_CAP + 1})`
          : sql`(select 1 from sizings s ${whereOf(conds)} limit ${COUNT_CAP + 1})`;
      return (await tx.execute<{ n: number }>(sql`select count(*)::int as n from ${from} t`)).rows[0]?.n ?? 0;
    };
    let conds = conditions(user, f, false);
    let n = await count(conds, false);
    if (f.q && n < FUZZY_BELOW && f.q.length >= 3) {
      conds = conditions(user, f, true);
      n = await count(conds, true);
    }
    const where = whereOf(conds);
    const rows = await tx.execute<SupportHit>(sql`
      select s.id, s.number, s.title, s.equipment_tag as "equipmentTag", s.service, s.gas_label as "gasLabel",
             s.headline_kw as "headlineKw", s.account_id as "accountId", a.name as "accountName",
             to_char(s.created_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS"Z"') as "createdAt", u.name as "createdByName",
             (select d.number from datasheets d where d.sizing_id = s.id) as "datasheetNumber",
             coalesce((select array_agg(q.number order by q.number) from quote_items qi join quotes q on q.id = qi.quote_id where qi.sizing_id = s.id), '{}') as "quoteNumbers"
      from sizings s
      join accounts a on a.id = s.account_id
      left join users u on u.id = s.created_by_user_id
      ${where}
      order by ${orderBy(f)}
      limit ${f.pageSize} offset ${offset}`);
    return {
      hits: rows.rows,
      total: Math.min(n, COUNT_CAP),
      totalIsEstimate: n > COUNT_CAP,
      page: f.page,
      pageSize: f.pageSize,
    };
  });
}

import { sql, type SQL } from 'drizzle-orm';
import { PER_CUSTOMER_UP_TO } from './customers';
import { idArray } from './filters';
import { escapeLike, type LookupTerms } from './terms';

/**
 * One way a sizing `s` can match the typed text, and how well a match of that kind answers it (0..1, for
 * the relevance order). The look-up runs each branch as its own indexed SELECT and unions the answers:
 * OR-ing them in one WHERE leaves PostgreSQL guessing and, on a million rows, scanning them all.
 */
export type Branch = {
  name: string;
  where: SQL;
  score: SQL;
  /** Customer matches: read each customer's sizings through its own index, in order (see ./page-query.ts). */
  accountIds?: string[];
  /** Title and notes matches: the text query, whose matches are found first (./text-walk.ts) and put in `ids`. */
  textQuery?: string;
  ids?: string[];
};

// Substring matching needs trigrams; shorter text is matched as a prefix.
const MIN_SUBSTRING = 3;

function customerBranch(name: string, ids: string[], score: SQL): Branch[] {
  if (!ids.length) return [];
  const where = sql`s.account_id = any(${idArray(ids)})`;
  return [{ name, where, score, accountIds: ids.length <= PER_CUSTOMER_UP_TO ? ids : undefined }];
}

/**
 * The branches that match what was typed as it stands: numbers, tag, title and notes words (`textQuery`,
 * see ./lexicon.ts), the customers whose name holds the text (`customers`), quote titles.
 */
export function exactBranches(t: LookupTerms, textQuery: string | null, customers: string[]): Branch[] {
  const out: Branch[] = [];
  const long = t.text.length >= MIN_SUBSTRING;
  const inside = long ? `%${escapeLike(t.text)}%` : `${escapeLike(t.text)}%`;
  if (t.numberPrefix) {
    const p = `${escapeLike(t.numberPrefix)}%`;
    out.push(
      { name: 'sizing number', where: sql`s.number like ${p}`, score: sql`1.0` },
      {
        name: 'datasheet number',
        where: sql`s.id in (select d.sizing_id from datasheets d where d.number like ${p})`,
        score: sql`1.0`,
      },
      {
        name: 'quote number',
        where: sql`s.id in (select qi.sizing_id from quote_items qi join quotes q on q.id = qi.quote_id where q.number like ${p})`,
        score: sql`0.95`,
      },
    );
  }
  out.push({
    name: 'tag',
    where: sql`lower(s.equipment_tag) like ${inside}`,
    score: sql`case when lower(s.equipment_tag) = ${t.text} then 0.9 when lower(s.equipment_tag) like ${`${escapeLike(t.text)}%`} then 0.8 else 0.6 end`,
  });
  if (textQuery) {
    const q = sql`to_tsquery('simple', ${textQuery})`;
    out.push({
      name: 'title or notes',
      where: sql`s.search_vector @@ ${q}`,
      score: sql`0.2 + least(0.5, ts_rank(s.search_vector, ${q}))`,
      textQuery,
    });
  }
  out.push(...customerBranch('customer', customers, sql`0.5`));
  if (long)
    out.push({
      name: 'quote title',
      where: sql`s.id in (select qi.sizing_id from quote_items qi join quotes q on q.id = qi.quote_id where lower(q.title) like ${inside})`,
      score: sql`0.4`,
    });
  return out;
}

/** Close spellings: the tags in use nearest the text (closeTagsSql in ./lexicon.ts), customers by word similarity. */
export function closeBranches(t: LookupTerms, tags: string[], customers: string[]): Branch[] {
  const out: Branch[] = [];
  if (tags.length)
    out.push({
      name: 'close tag',
      where: sql`lower(s.equipment_tag) in (${sql.join(
        tags.map((x) => sql`${x}`),
        sql`, `,
      )})`,
      score: sql`0.5 * similarity(lower(s.equipment_tag), ${t.text})`,
    });
  out.push(...customerBranch('close customer', customers, sql`0.4`));
  return out;
}

import 'server-only';
import { sql } from 'drizzle-orm';
import type { Db, Queryable } from '@/db';
import { escapeLike, type LookupTerms } from './terms';

// Close spellings tried for a word no sizing uses; trigram similarity above the transaction's threshold.
const CORRECTIONS_PER_WORD = 3;

// A prefix that begins no more words than this is searched as those words: PostgreSQL's statistics know how
// common each whole word is, but can only guess at a prefix, and a wrong guess picks a slow plan.
const EXPAND_PREFIX_UP_TO = 8;

/**
 * The text-search query for the typed words, or null when some word can match nothing. A word that
 * begins words in use is searched as those words (`regen` finds regeneration and regenerator); a word that
 * begins none is replaced by the closest words in use (`regeneraton` becomes regeneration | regenerator).
 * Checked against the short word list in one round trip, so a misspelt title costs no scan of the sizings.
 */
export async function textSearchQuery(conn: Queryable, terms: LookupTerms): Promise<string | null> {
  if (!terms.words.length) return null;
  const rows = sql.join(
    terms.words.map((w, i) => sql`(${i}::int, ${w}::text, ${`${escapeLike(w)}%`}::text)`),
    sql`, `,
  );
  const res = await conn.execute<{ i: number; begun: string[]; near: string[] | null }>(sql`
    select v.i, b.begun,
      case when cardinality(b.begun) = 0 and length(v.w) >= 3 then array(
        select word from search_words where word % v.w order by similarity(word, v.w) desc, word limit ${CORRECTIONS_PER_WORD}
      ) end as near
    from (values ${rows}) as v(i, w, prefix)
    cross join lateral (select array(
      select word from search_words where word like v.prefix order by word limit ${EXPAND_PREFIX_UP_TO + 1}
    ) as begun) b`);
  const parts: string[] = [];
  for (const r of res.rows.sort((a, b) => a.i - b.i)) {
    const word = terms.words[r.i]!;
    if (r.begun.length > EXPAND_PREFIX_UP_TO) parts.push(`${word}:*`);
    else if (r.begun.length) parts.push(`(${r.begun.join(' | ')})`);
    else if (r.near?.length) parts.push(`(${r.near.join(' | ')})`);
    else return null;
  }
  return [...parts, ...terms.numbers].join(' & ');
}

// Tags whose spelling is closest to the text: those at least STRICT alike when there are a few of them,
// otherwise down to the connection's floor (TRIGRAM_SIMILARITY in db/index.ts).
const CLOSE_TAGS = 20;
const STRICT = '0.5';
const ENOUGH_STRICT = 3;

const closestTags = (conn: Queryable, text: string) =>
  conn.execute<{ tag: string }>(sql`
    select tag from search_tags where tag % ${text} order by similarity(tag, ${text}) desc, tag limit ${CLOSE_TAGS}`);

/**
 * The tags in use spelt most like the text, best first; searched in the narrow tag list, not in the sizings.
 * The strict pass sets its own floor for `%`, which its trigram index then serves: on half a million tags,
 * filtering the floor's matches afterwards would recheck ten times as many.
 */
export async function closeTags(conn: Queryable & Pick<Db, 'transaction'>, text: string): Promise<string[]> {
  const strict = await conn.transaction(async (tx) => {
    await tx.execute(sql`select set_config('pg_trgm.similarity_threshold', ${STRICT}, true)`);
    return closestTags(tx, text);
  });
  if (strict.rows.length >= ENOUGH_STRICT) return strict.rows.map((r) => r.tag);
  return (await closestTags(conn, text)).rows.map((r) => r.tag);
}

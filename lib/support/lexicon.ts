import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import { escapeLike, type LookupTerms } from './terms';

// Close spellings tried for a word no sizing uses; trigram similarity above the transaction's threshold.
const CORRECTIONS_PER_WORD = 3;

// A prefix that begins no more words than this is searched as those words: PostgreSQL's statistics know how
// common each whole word is, but can only guess at a prefix, and a wrong guess picks a slow plan.
const EXPAND_PREFIX_UP_TO = 8;

/** What the word list holds for one typed word: the words it begins, else its closest spellings. */
export type WordChoice = { i: number; begun: string[]; near: string[] | null };

/**
 * A SELECT of one WordChoice per typed word, checked against the short word list (never the sizings), so a
 * misspelt title costs no scan; null when nothing was typed that the text search uses. Run it with the other
 * questions asked before the sizings are searched (./search.ts), then read it with textQueryFrom.
 */
export function wordChoices(terms: LookupTerms): SQL | null {
  if (!terms.words.length) return null;
  const rows = sql.join(
    terms.words.map((w, i) => sql`(${i}::int, ${w}::text, ${`${escapeLike(w)}%`}::text)`),
    sql`, `,
  );
  return sql`select v.i, b.begun,
      case when cardinality(b.begun) = 0 and length(v.w) >= 3 then array(
        select word from search_words where word % v.w order by similarity(word, v.w) desc, word limit ${CORRECTIONS_PER_WORD}
      ) end as near
    from (values ${rows}) as v(i, w, prefix)
    cross join lateral (select array(
      select word from search_words where word like v.prefix order by word limit ${EXPAND_PREFIX_UP_TO + 1}
    ) as begun) b`;
}

/**
 * The text-search query for the typed words, or null when some word can match nothing. A word that begins
 * words in use is searched as those words (`regen` finds regeneration and regenerator); a word that begins
 * none is replaced by the closest words in use (`regeneraton` becomes regeneration | regenerator).
 */
export function textQueryFrom(terms: LookupTerms, choices: WordChoice[]): string | null {
  const parts: string[] = [];
  for (const r of [...choices].sort((a, b) => a.i - b.i)) {
    const word = terms.words[r.i]!;
    if (r.begun.length > EXPAND_PREFIX_UP_TO) parts.push(`${word}:*`);
    else if (r.begun.length) parts.push(`(${r.begun.join(' | ')})`);
    else if (r.near?.length) parts.push(`(${r.near.join(' | ')})`);
    else return null;
  }
  return parts.length ? [...parts, ...terms.numbers].join(' & ') : null;
}

// Tags whose spelling is closest to the text: those at least 0.5 alike (dutywise_tags_spelt_like, migration
// 0015) when there are a few of them, otherwise down to the connection's floor (TRIGRAM_SIMILARITY in db/index.ts).
const CLOSE_TAGS = 20;
const ENOUGH_STRICT = 3;

/**
 * A SELECT of one row holding `tags`: the tags in use spelt most like the text, best first, searched in the
 * narrow tag list, not in the sizings. The looser search runs only when the strict one finds too few.
 */
export function closeTagsSql(text: string): SQL {
  return sql`select case when cardinality(strict.tags) >= ${ENOUGH_STRICT} then strict.tags
      else array(select tag from search_tags where tag % ${text}
        order by similarity(tag, ${text}) desc, tag limit ${CLOSE_TAGS}) end as tags
    from (select array(select dutywise_tags_spelt_like(${text}, ${CLOSE_TAGS})) as tags) strict`;
}

/** What the look-up makes of the text typed into it. Pure: no database, no framework. */
export type LookupTerms = {
  /** The whole text, trimmed and lower case: matched inside tags, customer names and quote titles. */
  text: string;
  /** An upper-case document-number prefix (`S26-01`, `Q26-0101`, `DS26`) when the text looks like one. */
  numberPrefix: string | null;
  /** Words for the text search over titles and notes; empty when the text is a code such as a tag. */
  words: string[];
  /** Whole numbers typed among the words (`kiln 3`): matched exactly in titles and notes. */
  numbers: string[];
};

// Dutywise numbers: S (sizing), Q (quote) or DS (datasheet), the two-digit year, a dash and a sequence.
const DOCUMENT_NUMBER = /^(s|q|ds)\d{1,2}(-\d*)?$/i;
const WORD = /^\p{L}+$/u;
const DIGITS = /^\d+$/;
// Linking words say nothing about a sizing; the text search (no stemming, no stop list) would demand them.
const LINKING = new Set(['a', 'an', 'and', 'at', 'by', 'for', 'in', 'of', 'on', 'or', 'the', 'to', 'with']);

/**
 * Splits the typed text into what each part of the look-up can use. A token that mixes letters and digits
 * (`EH-4711`, `4711a`) is a code: it is matched as a tag or number, and the text search is left out.
 */
export function parseLookupText(raw: string): LookupTerms {
  const text = raw.trim().toLowerCase().replace(/\s+/g, ' ');
  const numberPrefix = DOCUMENT_NUMBER.test(text) ? text.toUpperCase() : null;
  const words: string[] = [];
  const numbers: string[] = [];
  let code = false;
  for (const token of text.split(' ')) {
    const parts = token.split(/[^\p{L}\d]+/u).filter(Boolean);
    const letters = parts.some((p) => WORD.test(p));
    const digits = parts.some((p) => DIGITS.test(p));
    if ((letters && digits) || parts.some((p) => !WORD.test(p) && !DIGITS.test(p))) code = true;
    for (const p of parts) {
      if (WORD.test(p) && p.length >= 2 && !LINKING.has(p)) words.push(p);
      else if (DIGITS.test(p)) numbers.push(p);
    }
  }
  return code || !words.length
    ? { text, numberPrefix, words: [], numbers: [] }
    : { text, numberPrefix, words: [...new Set(words)].slice(0, 8), numbers: [...new Set(numbers)].slice(0, 4) };
}

/** Escapes LIKE's wildcards so typed `%` and `_` match themselves. */
export function escapeLike(s: string): string {
  return s.replace(/[%_\\]/g, (c) => `\\${c}`);
}

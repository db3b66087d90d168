import { sql } from 'drizzle-orm';
import { index, pgTable, text } from 'drizzle-orm/pg-core';

/**
 * Every word (three letters or more) used in a sizing's title or notes, kept by a trigger on sizings. The
 * look-up checks a typed word against this short list, and corrects a misspelt one to its nearest entries,
 * before it searches a million sizings by text. Words no sizing uses any more stay: they match nothing.
 */
export const searchWords = pgTable('search_words', { word: text('word').primaryKey() }, (t) => [
  index('search_words_trgm_idx').using('gin', sql`${t.word} gin_trgm_ops`),
]);

/** Every equipment tag in use, lower case, kept by the same trigger: a narrow table for close-spelling matches. */
export const searchTags = pgTable('search_tags', { tag: text('tag').primaryKey() }, (t) => [
  index('search_tags_trgm_idx').using('gin', sql`${t.tag} gin_trgm_ops`),
]);

import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import { escapeLike } from './terms';

/** Beyond this many matching customers the text is too vague to page customer by customer. */
export const PER_CUSTOMER_UP_TO = 200;

/**
 * A SELECT of the ids of the customers whose name holds the text (or, with `close`, holds a word spelt like it),
 * asked before the sizings are searched: PostgreSQL cannot know how many sizings an unknown set of customers
 * has, and guessing high makes it read every sizing newest first in search of ones that do not exist.
 */
export function customersNamedSql(text: string, close: boolean): SQL {
  const match = close
    ? sql`${text} <% a.name and not a.name ilike ${`%${escapeLike(text)}%`}`
    : sql`a.name ilike ${text.length >= 3 ? `%${escapeLike(text)}%` : `${escapeLike(text)}%`}`;
  return sql`select a.id from accounts a where ${match} limit ${PER_CUSTOMER_UP_TO + 1}`;
}

import 'server-only';
import { sql } from 'drizzle-orm';
import type { Queryable } from '@/db';
import { escapeLike } from './terms';

/** Beyond this many matching customers the text is too vague to page customer by customer. */
export const PER_CUSTOMER_UP_TO = 200;

/**
 * Ids of the customers whose name holds the text (or, with `close`, holds a word spelt like it), looked up
 * before the sizings: PostgreSQL cannot know how many sizings an unknown set of customers has, and guessing
 * high makes it read every sizing newest first in search of ones that do not exist.
 */
export async function customersNamed(conn: Queryable, text: string, close: boolean): Promise<string[]> {
  const match = close
    ? sql`${text} <% a.name and not a.name ilike ${`%${escapeLike(text)}%`}`
    : sql`a.name ilike ${text.length >= 3 ? `%${escapeLike(text)}%` : `${escapeLike(text)}%`}`;
  const res = await conn.execute<{ id: string }>(
    sql`select a.id from accounts a where ${match} limit ${PER_CUSTOMER_UP_TO + 1}`,
  );
  return res.rows.map((r) => r.id);
}

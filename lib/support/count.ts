import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '@/db';
import type { Branch } from './branches';
import { allOf } from './filters';

/** Counted exactly up to here; beyond it the answer is "about N". */
export const EXACT_COUNT_UP_TO = 1_000;
// A plan estimate above this is trusted without counting: counting sixty thousand matches costs seconds.
const TRUST_ESTIMATE_ABOVE = 5_000;

export type MatchCount = { total: number; estimated: boolean };

/** "About" figures keep two significant digits: 58,581 reads as about 59,000. */
export function roundAbout(n: number): number {
  if (n < 100) return Math.round(n);
  const step = 10 ** (Math.floor(Math.log10(n)) - 1);
  return Math.round(n / step) * step;
}

function matchingIds(branches: Branch[] | null, filters: SQL[]): SQL {
  if (!branches) return sql`select s.id from sizings s where ${allOf(filters)}`;
  return sql.join(
    branches.map((b) => sql`select s.id from sizings s where ${allOf([b.where, ...filters])}`),
    sql` union all `,
  );
}

/**
 * How many sizings match: exact up to EXACT_COUNT_UP_TO, otherwise PostgreSQL's own estimate from its
 * planner statistics (the rows EXPLAIN expects), which costs a plan and no scan, or `floor` if that is higher.
 */
export async function countMatches(
  conn: Queryable,
  branches: Branch[] | null,
  filters: SQL[],
  floor = 0,
): Promise<MatchCount> {
  const ids = matchingIds(branches, filters);
  const plan = await conn.execute<{ 'QUERY PLAN': [{ Plan: { 'Plan Rows': number } }] }>(
    sql`explain (format json) ${ids}`,
  );
  // The planner multiplies word frequencies as if words were unrelated; a sample says otherwise.
  const estimate = Math.max(plan.rows[0]?.['QUERY PLAN'][0].Plan['Plan Rows'] ?? 0, floor);
  if (estimate > TRUST_ESTIMATE_ABOVE) return { total: roundAbout(estimate), estimated: true };
  // A sizing matched by two branches appears twice in the union; count each once.
  const res = await conn.execute<{ n: number; raw: number }>(
    sql`select count(distinct id)::int as n, count(*)::int as raw from (${ids} limit ${EXACT_COUNT_UP_TO + 1}) t`,
  );
  const { n, raw } = res.rows[0] ?? { n: 0, raw: 0 };
  if (raw <= EXACT_COUNT_UP_TO) return { total: n, estimated: false };
  return { total: Math.max(roundAbout(estimate), EXACT_COUNT_UP_TO + 1), estimated: true };
}

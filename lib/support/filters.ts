import { sql, type SQL } from 'drizzle-orm';
import type { SupportSearch } from './schema';

/**
 * The narrowing conditions on sizings `s`: who may see what (`scope`, an account id or null for staff) and
 * the look-up's filters. Text matching is separate (./branches.ts); these apply to every branch alike.
 */
export function filterConditions(scope: string | null, f: SupportSearch): SQL[] {
  const c: SQL[] = [];
  if (scope) c.push(sql`s.account_id = ${scope}`);
  if (f.accountId) c.push(sql`s.account_id = ${f.accountId}`);
  if (f.service) c.push(sql`s.service = ${f.service}`);
  if (f.gas) c.push(sql`s.gas_key = ${f.gas}`);
  if (f.minKw !== undefined) c.push(sql`s.headline_kw >= ${f.minKw}`);
  if (f.maxKw !== undefined) c.push(sql`s.headline_kw <= ${f.maxKw}`);
  if (f.from) c.push(sql`s.created_at >= ${f.from}::date`);
  if (f.to) c.push(sql`s.created_at < (${f.to}::date + 1)`);
  if (f.creator) c.push(sql`s.created_by_user_id = ${f.creator}`);
  if (f.quoteStatus)
    c.push(
      sql`s.id in (select qi.sizing_id from quote_items qi join quotes q on q.id = qi.quote_id where q.status = ${f.quoteStatus})`,
    );
  return c;
}

/** Conditions joined with AND; `true` when there are none. */
export function allOf(conds: (SQL | null)[]): SQL {
  const present = conds.filter((c): c is SQL => c !== null);
  return present.length ? sql.join(present, sql` and `) : sql`true`;
}

/** A literal uuid array: PostgreSQL plans with its real length, where a subquery's would be a guess. */
export const idArray = (ids: string[]) =>
  ids.length
    ? sql`array[${sql.join(
        ids.map((id) => sql`${id}`),
        sql`, `,
      )}]::uuid[]`
    : sql`'{}'::uuid[]`;

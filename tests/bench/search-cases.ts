// The look-ups support staff type, one of each kind, with numbers and names taken from the generated data.
// The latency benchmark times each; the load benchmark cycles through all of them as its realistic mix.
import { sql } from 'drizzle-orm';
import type { Db } from '@/db';
import { customerNames } from './generate/vocabulary';

export type LookupCase = {
  label: string;
  query: Record<string, string | number>;
  /** Time the second page: the first is read once for its cursor. */
  secondPage?: boolean;
};

async function one(db: Db, query: ReturnType<typeof sql>): Promise<string> {
  // Picking the cases scans the generated numbers, which on five million sizings outlasts the app role's
  // statement time-out; the look-ups themselves are timed under it.
  const [row] = await db.transaction(async (tx) => {
    await tx.execute(sql`set local statement_timeout = 0`);
    return (await tx.execute<{ v: string }>(query)).rows;
  });
  if (!row) throw new Error('the benchmark database lacks generated data; run generate-sizings first');
  return row.v;
}

/** A year of data that is fully inside the generated five years: the last complete calendar year. */
export function lastFullYear(): { from: string; to: string } {
  const y = new Date().getUTCFullYear() - 1;
  return { from: `${y}-01-01`, to: `${y}-12-31` };
}

export async function lookupCases(db: Db): Promise<LookupCase[]> {
  const sizing = await one(
    db,
    sql`select number as v from sizings where engine_version = 'bench' and number like 'S__-0%' order by number desc offset 500 limit 1`,
  );
  const quote = await one(
    db,
    sql`select number as v from quotes where number like 'Q__-0%' order by number desc offset 50 limit 1`,
  );
  const datasheet = await one(
    db,
    sql`select number as v from datasheets where number like 'DS__-0%' order by number desc offset 50 limit 1`,
  );
  const customer = customerNames[17]!;
  return [
    { label: 'sizing number', query: { q: sizing } },
    { label: 'quote number', query: { q: quote } },
    { label: 'datasheet number', query: { q: datasheet } },
    { label: 'equipment tag, partial (EH-4711)', query: { q: 'EH-4711' } },
    { label: 'equipment tag with a typo (EH 4171A)', query: { q: 'EH 4171A' } },
    { label: 'title with a typo (regeneraton heater)', query: { q: 'regeneraton heater' } },
    { label: 'notes with a typo (stainles sheath)', query: { q: 'stainles sheath' } },
    { label: `customer name (${customer})`, query: { q: customer } },
    {
      label: `customer name with a typo (${customer.replace('holt', 'hold')})`,
      query: { q: customer.replace('holt', 'hold') },
    },
    {
      label: 'filters only: heater, 100-200 kW, one year',
      query: { service: 'heater', minKw: 100, maxKw: 200, ...lastFullYear() },
    },
    { label: 'broad prefix matching thousands (EH-4)', query: { q: 'EH-4' } },
    { label: 'broad prefix, largest first, page 2', query: { q: 'EH-4', sort: 'largest' }, secondPage: true },
  ];
}

/** The query to time: the case's own, or for a second page the first page's cursor added. */
export async function queryToTime(
  c: LookupCase,
  firstPage: (q: Record<string, string | number>) => Promise<{ nextCursor: string | null }>,
): Promise<Record<string, string | number>> {
  if (!c.secondPage) return c.query;
  const { nextCursor } = await firstPage(c.query);
  return nextCursor ? { ...c.query, cursor: nextCursor, page: 2 } : c.query;
}

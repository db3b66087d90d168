import 'server-only';
import { sql } from 'drizzle-orm';
import type { Tx } from '@/db';

// Dutywise document numbers: a letter prefix, the two-digit year, and a database sequence,
// so numbers are unique across every app instance (Q26-0101, S26-01001, DS26-0501).
const formats = {
  quote: { prefix: 'Q', seq: 'quote_number_seq', width: 4 },
  sizing: { prefix: 'S', seq: 'sizing_number_seq', width: 5 },
  datasheet: { prefix: 'DS', seq: 'datasheet_number_seq', width: 4 },
} as const;

export type NumberKind = keyof typeof formats;

function format(kind: NumberKind, n: string): string {
  const f = formats[kind];
  const yy = String(new Date().getUTCFullYear() % 100).padStart(2, '0');
  return `${f.prefix}${yy}-${n.padStart(f.width, '0')}`;
}

export async function nextNumber(tx: Tx, kind: NumberKind): Promise<string> {
  const res = await tx.execute<{ n: string }>(sql`select nextval(${formats[kind].seq}::regclass)::text as n`);
  return format(kind, res.rows[0]?.n ?? '0');
}

/** `count` numbers in one round trip, for batch saves. */
export async function nextNumbers(tx: Tx, kind: NumberKind, count: number): Promise<string[]> {
  const res = await tx.execute<{ n: string }>(
    sql`select nextval(${formats[kind].seq}::regclass)::text as n from generate_series(1, ${count})`,
  );
  return res.rows.map((r) => format(kind, r.n));
}

// Support look-up latency: every kind of query support staff type, timed through lib/support against the
// database in DATABASE_URL; target p95 < 100 ms each on a million sizings. Run once per database size.
import { sql } from 'drizzle-orm';
import { db, pool } from '@/db';
import type { CurrentUser } from '@/lib/auth/current-user';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';
import { lookupCases, queryToTime } from './search-cases';
import { percentile, recordResults, verdict } from './stats';

const support: CurrentUser = {
  id: '00000000-0000-0000-0000-000000000001',
  email: 'bench@bench.example',
  name: 'Bench',
  role: 'support',
  accountId: null,
  unitSystem: 'si',
};
const RUNS = Number(process.env.BENCH_SEARCH_RUNS ?? 40);
const TARGET_MS = 100;

async function time(q: Record<string, unknown>, runs: number): Promise<{ samples: number[]; total: string }> {
  const parsed = supportSearchSchema.parse(q);
  const samples: number[] = [];
  let total = '';
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    const res = await searchSizings(support, parsed);
    samples.push(performance.now() - t0);
    total = `${res.totalIsEstimate ? 'about ' : ''}${res.total.toLocaleString('en-GB')}`;
  }
  return { samples, total };
}

async function main() {
  const [{ n } = { n: 0 }] = (
    await db.execute<{ n: number }>(sql`select reltuples::bigint::int as n from pg_class where relname = 'sizings'`)
  ).rows;
  const size = n >= 1e6 ? `${(n / 1e6).toFixed(n % 1e6 ? 1 : 0)} M` : `${Math.round(n / 1e3)} k`;
  const rows: [string, string, string, string][] = [['sizings searched', n.toLocaleString('en-GB'), 'info', '—']];
  const headline = n >= 900_000 && n < 1_100_000;
  for (const c of await lookupCases(db)) {
    const query = await queryToTime(c, (q) => searchSizings(support, supportSearchSchema.parse(q)));
    await time(query, 3); // warm the cache as a live system would be
    const { samples, total } = await time(query, RUNS);
    const p95 = percentile(samples, 95);
    rows.push([
      `${c.label} → ${total}: p50 / p95`,
      `${percentile(samples, 50).toFixed(1)} / ${p95.toFixed(1)} ms`,
      headline ? `p95 < ${TARGET_MS} ms` : 'info',
      headline ? verdict(p95 < TARGET_MS) : '—',
    ]);
  }
  recordResults(`Support look-up, ${size} sizings`, rows);
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());

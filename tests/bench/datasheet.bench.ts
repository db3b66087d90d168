// Datasheet render-and-store: issue ~40 revisions against the database at DATABASE_URL, each the full
// path a user triggers (plan, render the PDF, hash, store the blob and rows in one transaction).
// Run: npx tsx --require ./db/script-preload.cjs tests/bench/datasheet.bench.ts   (targets: median < 300 ms, p95 < 600 ms)
import { randomUUID } from 'node:crypto';
import { db, pool } from '@/db';
import { accounts, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { getBlobStore } from '@/lib/blob';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { calculate } from '@/lib/engine';
import { insertSizing } from '@/lib/sizings/save';
import { seedSizings } from '@/db/seed-scenario';
import { percentile, recordResults, verdict } from './stats';

const ISSUES = 40;
const WARM_UP = 3;

function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}

async function main() {
  const [acct] = await db
    .insert(accounts)
    .values({
      name: `Datasheet bench ${randomUUID().slice(0, 6)}`,
      site: 'Bench hall',
      billingContactEmail: 'bench@customer.example',
    })
    .returning({ id: accounts.id });
  const [u] = await db
    .insert(users)
    .values({ email: `ds-bench-${randomUUID()}@bench.example`, name: 'Datasheet bench', role: 'sales_engineer' })
    .returning({ id: users.id });
  const user: CurrentUser = {
    id: u!.id,
    email: 'ds-bench@bench.example',
    name: 'Datasheet bench',
    role: 'sales_engineer',
    accountId: null,
    unitSystem: 'si',
  };
  // The demo scenario's heaters and compressors (invented duty points), one sizing each.
  const sizingIds: string[] = [];
  for (const s of seedSizings) {
    const result = calculate(s.input);
    const row = await db.transaction((tx) =>
      insertSizing(
        tx,
        user,
        {
          accountId: acct!.id,
          title: s.title,
          equipmentTag: s.tag,
          notes: undefined,
          quoteId: undefined,
          revisedFromId: undefined,
        },
        { input: s.input, result },
      ),
    );
    sizingIds.push(row.id);
  }
  const store = getBlobStore();
  const coldT0 = performance.now();
  await issueDatasheet(user, { sizingId: sizingIds[0]! });
  const coldMs = performance.now() - coldT0;
  for (let i = 1; i < WARM_UP; i++) await issueDatasheet(user, { sizingId: sizingIds[i % sizingIds.length]! });

  const wall: number[] = [];
  const cpu: number[] = [];
  let bytes = 0;
  for (let i = 0; i < ISSUES; i++) {
    const c0 = cpuMs();
    const t0 = performance.now();
    const issued = await issueDatasheet(user, {
      sizingId: sizingIds[i % sizingIds.length]!,
      note: `Bench revision ${i}`,
    });
    wall.push(performance.now() - t0);
    cpu.push(cpuMs() - c0);
    bytes += issued.byteSize;
  }
  const median = percentile(wall, 50);
  const p95 = percentile(wall, 95);
  const ms = (v: number) => `${v.toFixed(0)} ms`;
  recordResults(
    `Datasheet render-and-store (${ISSUES} issues, ${store.kind} blob store, ${(bytes / ISSUES / 1024).toFixed(0)} KiB average PDF)`,
    [
      ['median wall clock per issue', ms(median), '< 300 ms', verdict(median < 300)],
      ['p95 wall clock per issue', ms(p95), '< 600 ms', verdict(p95 < 600)],
      ['median CPU of this process per issue', ms(percentile(cpu, 50)), 'info', '-'],
      ['max wall clock per issue', ms(Math.max(...wall)), 'info', '-'],
      ['first issue in a fresh process (fonts, renderer load)', ms(coldMs), 'info', '-'],
    ],
  );
  console.log(`\n${verdict(median < 300 && p95 < 600)}: median ${ms(median)}, p95 ${ms(p95)}`);
  await pool.end();
}

main().catch(async (err) => {
  console.error(err);
  await pool.end();
  process.exit(1);
});

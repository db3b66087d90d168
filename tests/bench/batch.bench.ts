// A 1,000-row enquiry: parse, validate, size and save with its quote and upload; target under 5 s.
import { randomUUID } from 'node:crypto';
import { db, pool } from '@/db';
import { accounts, users } from '@/db/schema';
import { saveBatch } from '@/lib/batch/commit';
import { parseBatchCsv } from '@/lib/batch/parse';
import { batchSheet as sheet } from './batch-sheet';
import { recordResults, verdict } from './stats';

async function main() {
  const [acct] = await db
    .insert(accounts)
    .values({ name: `Batch bench ${randomUUID().slice(0, 6)}` })
    .returning({ id: accounts.id });
  const [u] = await db
    .insert(users)
    .values({ email: `batch-${randomUUID()}@bench.example`, name: 'Batch bench', role: 'sales_engineer' })
    .returning({ id: users.id });
  const user = {
    id: u!.id,
    email: 'b@bench.example',
    name: 'Batch bench',
    role: 'sales_engineer' as const,
    accountId: null,
    unitSystem: 'si' as const,
  };
  const text = sheet(1000);
  const samples: number[] = [];
  for (let run = 0; run < 3; run++) {
    const t0 = performance.now();
    const parsed = parseBatchCsv(text);
    const res = await saveBatch(user, { accountId: acct!.id, newQuoteTitle: `Bench enquiry ${run}` }, parsed.rows, {
      name: 'bench.csv',
      type: 'text/csv',
      bytes: Buffer.from(text),
    });
    samples.push(performance.now() - t0);
    if (res.saved !== 1000) throw new Error(`saved ${res.saved} of 1000`);
  }
  const worst = Math.max(...samples);
  recordResults('Batch upload', [
    [
      '1,000-row sheet parsed, sized and saved (worst of 3)',
      `${(worst / 1000).toFixed(2)} s`,
      '< 5 s',
      verdict(worst < 5000),
    ],
  ]);
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());

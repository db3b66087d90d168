import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { sizings } from '@/db/schema';
import { EXACT_COUNT_UP_TO } from '@/lib/support/count';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';
import { makeAccount, makeUser } from '../helpers/fixtures';

const q = (over: Record<string, unknown>) => supportSearchSchema.parse(over);

/** `n` sizings in one account, one insert, `kw` rising and created a second apart. */
async function manySizings(accountId: string, userId: string, n: number) {
  const t0 = Date.now() - n * 1000;
  const rows = Array.from({ length: n }, (_, i) => ({
    number: `X-${randomUUID().slice(0, 13)}`,
    accountId,
    title: `Paging sizing ${i}`,
    equipmentTag: `PG-${i}`,
    service: 'heater' as const,
    gasKey: 'air',
    gasLabel: 'air',
    input: { fixture: true },
    result: { fixture: true },
    engineVersion: 'fixture',
    headlineKw: 10 + (i % 7),
    massFlowKgPerS: 0.5,
    createdByUserId: userId,
    createdAt: new Date(t0 + i * 1000),
  }));
  return (await db.insert(sizings).values(rows).returning({ id: sizings.id })).map((r) => r.id);
}

describe('support look-up paging', () => {
  it('walks every sizing exactly once by cursor, newest first and largest first', async () => {
    const acct = await makeAccount('Paging');
    const support = await makeUser('support');
    const ids = await manySizings(acct.id, support.id, 60);
    for (const sort of ['newest', 'largest', 'smallest', 'oldest'] as const) {
      const seen: string[] = [];
      const kws: number[] = [];
      let cursor: string | undefined;
      for (let page = 1; page < 10; page++) {
        const res = await searchSizings(support, q({ accountId: acct.id, sort, cursor, page, pageSize: 25 }));
        seen.push(...res.hits.map((h) => h.id));
        kws.push(...res.hits.map((h) => h.headlineKw));
        expect(res.total).toBe(60);
        if (!res.nextCursor) break;
        cursor = res.nextCursor;
      }
      expect(seen).toHaveLength(60);
      expect(new Set(seen)).toEqual(new Set(ids));
      if (sort === 'newest') expect(seen).toEqual([...ids].reverse());
      if (sort === 'largest') expect(kws).toEqual([...kws].sort((a, b) => b - a));
    }
  });

  it('starts again from the first page when the cursor is damaged', async () => {
    const acct = await makeAccount('Paging damaged');
    const support = await makeUser('support');
    const ids = await manySizings(acct.id, support.id, 3);
    const res = await searchSizings(support, q({ accountId: acct.id, cursor: 'bm90LWEtY3Vyc29y' }));
    expect(res.hits.map((h) => h.id)).toEqual([...ids].reverse());
  });

  it(`counts exactly up to ${EXACT_COUNT_UP_TO} and says "about" beyond`, async () => {
    const acct = await makeAccount('Paging count');
    const support = await makeUser('support');
    await manySizings(acct.id, support.id, EXACT_COUNT_UP_TO + 50);
    const res = await searchSizings(support, q({ accountId: acct.id }));
    expect(res.totalIsEstimate).toBe(true);
    expect(res.total).toBeGreaterThan(EXACT_COUNT_UP_TO);
    const narrow = await searchSizings(support, q({ accountId: acct.id, minKw: 16 }));
    expect(narrow.totalIsEstimate).toBe(false);
    // i % 7 === 6 for 150 of the 1,050 rows
    expect(narrow.total).toBe(150);
  });
});

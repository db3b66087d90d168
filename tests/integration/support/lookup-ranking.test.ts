import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { sizings } from '@/db/schema';
import { paddedDocumentNumber } from '@/lib/support/numbers';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

const q = (over: Record<string, unknown>) => supportSearchSchema.parse(over);

describe('look-up numbers, ranking and the sales engineer scope', () => {
  it('reads a short document number as the padded one', () => {
    expect(paddedDocumentNumber('DS26-501')).toBe('DS26-0501');
    expect(paddedDocumentNumber('q26-7')).toBe('Q26-0007');
    expect(paddedDocumentNumber('S26-1001')).toBe('S26-01001');
    expect(paddedDocumentNumber('DS26-0501')).toBeNull();
    expect(paddedDocumentNumber('dryer')).toBeNull();
  });

  it('finds a sizing number typed without its leading zero first, and ranks by match when text is typed', async () => {
    const acct = await makeAccount('Ranking');
    const support = await makeUser('support');
    const engineer = await makeUser('sales_engineer');
    const seq = String(10000 + Math.floor(Math.random() * 89999)).slice(0, 4);
    const id = await makeSizingRow(acct.id, engineer.id);
    await db
      .update(sizings)
      .set({ number: `S99-0${seq}` })
      .where(eq(sizings.id, id));
    const res = await searchSizings(support, q({ q: `S99-${seq}` }));
    expect(res.hits[0]?.id).toBe(id);

    const word = `fenrunner${randomUUID().slice(0, 4)}`;
    const weak = await makeSizingRow(acct.id, engineer.id, `pre${word}post-1`);
    const strong = await makeSizingRow(acct.id, engineer.id, `${word}-2`);
    await db
      .update(sizings)
      .set({ createdAt: new Date(Date.now() - 86_400_000) })
      .where(eq(sizings.id, strong));
    const ranked = await searchSizings(support, q({ q: word, accountId: acct.id }));
    // Both contain the text; newest first would put the weaker, newer match on top. With text typed the
    // whole-word match leads; choosing "newest" puts it back.
    expect(ranked.hits.map((h) => h.id)).toEqual([strong, weak]);
    const newest = await searchSizings(support, q({ q: word, accountId: acct.id, sort: 'newest' }));
    expect(newest.hits.map((h) => h.id)).toEqual([weak, strong]);
  });

  it("gives a sales engineer their own customers' sizings only", async () => {
    const theirs = await makeAccount('Own customer');
    const others = await makeAccount('Another engineer customer');
    const engineer = await makeUser('sales_engineer');
    const colleague = await makeUser('sales_engineer');
    const tag = `OWN-${randomUUID().slice(0, 6)}`;
    const mine = await makeSizingRow(theirs.id, engineer.id, `${tag}-1`);
    const notMine = await makeSizingRow(others.id, colleague.id, `${tag}-2`);
    const seen = (await searchSizings(engineer, q({ q: tag }))).hits.map((h) => h.id);
    expect(seen).toEqual([mine]);
    const support = await makeUser('support');
    expect((await searchSizings(support, q({ q: tag }))).hits.map((h) => h.id).sort()).toEqual([mine, notMine].sort());
  });
});

import { describe, expect, it } from 'vitest';
import { groupWhileBusy } from '@/db/grouped';

/** A stand-in statement: records each round trip's inputs and answers them doubled, after a tick. */
function doubling(failOn?: number) {
  const trips: number[][] = [];
  const run = async (xs: number[]) => {
    trips.push(xs);
    await new Promise((r) => setTimeout(r, 5));
    if (failOn !== undefined && xs.includes(failOn)) throw new Error(`cannot take ${failOn}`);
    return xs.map((x) => x * 2);
  };
  return { trips, one: groupWhileBusy(run) };
}

describe('groupWhileBusy', () => {
  it('sends a lone call at once, on its own', async () => {
    const { trips, one } = doubling();
    expect(await one(4)).toBe(8);
    expect(trips).toEqual([[4]]);
  });

  it('gathers the calls made while a round trip is out into the next one, answering each its own', async () => {
    const { trips, one } = doubling();
    const answers = await Promise.all(Array.from({ length: 20 }, (_, i) => one(i)));
    expect(answers).toEqual(Array.from({ length: 20 }, (_, i) => i * 2));
    expect(trips).toEqual([[0], Array.from({ length: 19 }, (_, i) => i + 1)]);
  });

  it('a failing round trip is retried call by call: only the bad input fails', async () => {
    const { trips, one } = doubling(7);
    const results = await Promise.allSettled([one(1), one(7), one(9)]);
    expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
    expect(results[2]).toEqual({ status: 'fulfilled', value: 18 });
    expect(trips).toEqual([[1], [7, 9], [7], [9]]);
  });
});

import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeTagsSql } from '@/lib/support/lexicon';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

/**
 * Ten different letters from a to p, in a random order: no trigram repeats, none is shared with another test's
 * by chance, and the q and z the variants end in are never among them.
 */
const letters = () =>
  [...'abcdefghijklmnop']
    .map((c) => ({ c, r: Math.random() }))
    .sort((a, b) => a.r - b.r)
    .slice(0, 10)
    .map((x) => x.c)
    .join('');

const closeTags = async (text: string) => (await db.execute<{ tags: string[] }>(closeTagsSql(text))).rows[0]!.tags;

// pg_trgm's similarity is shared trigrams over all trigrams of the two (padded) words. Against a ten-letter
// word (12 trigrams), changing its last letter leaves 9 of 15 shared (0.6), its last two 8 of 16 (0.5), its last
// three 7 of 17 (0.41): strict matches, and one only the connection's 0.4 floor lets through.
describe('close spellings of a tag', () => {
  it('takes only the tags at least 0.5 alike when there are three of them', async () => {
    const acct = await makeAccount('Close tags');
    const support = await makeUser('support');
    const w = letters();
    const [one, two, three, loose] = [
      `${w.slice(0, 9)}q`,
      `${w.slice(0, 9)}z`,
      `${w.slice(0, 8)}qq`,
      `${w.slice(0, 7)}qqq`,
    ];
    for (const tag of [one, two, three, loose]) await makeSizingRow(acct.id, support.id, tag);
    const tags = await closeTags(w);
    expect([...tags].sort()).toEqual([one, two, three].sort());
    expect(tags.at(-1)).toBe(three);
  });

  it('goes down to the 0.4 floor when fewer than three are that alike', async () => {
    const acct = await makeAccount('Close tags loose');
    const support = await makeUser('support');
    const w = letters();
    const loose = `${w.slice(0, 7)}qqq`;
    await makeSizingRow(acct.id, support.id, loose);
    expect(await closeTags(w)).toEqual([loose]);
  });
});

import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { datasheets, quoteItems, quotes } from '@/db/schema';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

const q = (over: Record<string, unknown>) => supportSearchSchema.parse(over);
const ids = async (...args: Parameters<typeof searchSizings>) => (await searchSizings(...args)).hits.map((h) => h.id);
/** A made-up word no other test uses: ten letters. */
const word = () =>
  `qz${randomUUID()
    .replace(/[^a-f]/g, '')
    .padEnd(8, 'b')
    .slice(0, 8)}`;
const digits = () => String(Math.floor(1e6 + Math.random() * 8e6));

describe('support look-up by text', () => {
  it('finds a title word from its beginning and from a misspelling, and a notes phrase', async () => {
    const acct = await makeAccount('Text');
    const support = await makeUser('support');
    const [w, n] = [word(), word()];
    const id = await makeSizingRow(acct.id, support.id, undefined, {
      title: `Calciner ${w} heater`,
      notes: `Customer wants a ${n} sheath.`,
    });
    expect(await ids(support, q({ q: w.slice(0, 6) }))).toContain(id);
    // one letter dropped: corrected against the words in use before the sizings are searched
    const typo = w.slice(0, 5) + w.slice(6);
    const res = await searchSizings(support, q({ q: `${typo} heater` }));
    expect(res.hits.map((h) => h.id)).toContain(id);
    expect(await ids(support, q({ q: `${n} sheath` }))).toContain(id);
    // every typed word must match
    expect(await ids(support, q({ q: `${w} xylophonic` }))).not.toContain(id);
  });

  it('finds sizings by datasheet and quote number prefixes, and by their own number', async () => {
    const acct = await makeAccount('Numbers');
    const support = await makeUser('support');
    const [ds, qn, sn] = [`DS26-${digits()}`, `Q26-${digits()}`, `S26-${digits()}`];
    const a = await makeSizingRow(acct.id, support.id, undefined, { number: sn });
    const b = await makeSizingRow(acct.id, support.id);
    const c = await makeSizingRow(acct.id, support.id);
    await db.insert(datasheets).values({ number: ds, accountId: acct.id, sizingId: b });
    const [quote] = await db
      .insert(quotes)
      .values({ number: qn, accountId: acct.id, title: `Quote ${word()}` })
      .returning();
    await db.insert(quoteItems).values({ quoteId: quote!.id, sizingId: c });
    const bySizingNumber = await searchSizings(support, q({ q: sn.toLowerCase() }));
    expect(bySizingNumber.hits.map((h) => h.id)).toEqual([a]);
    // A number that found its record is the answer: no close spellings of tags or customers are mixed in.
    expect(bySizingNumber.closeMatches).toBe(false);
    expect(await ids(support, q({ q: ds.slice(0, -2) }))).toContain(b);
    expect(await ids(support, q({ q: qn }))).toEqual([c]);
  });

  it('finds a customer by a misspelt name and says close spellings were used', async () => {
    const name = `Brackwater${word()} Maltings`;
    const acct = await makeAccount(name);
    const support = await makeUser('support');
    const id = await makeSizingRow(acct.id, support.id);
    const typo = name.replace('Brackwater', 'Brakwater');
    const res = await searchSizings(support, q({ q: typo }));
    expect(res.closeMatches).toBe(true);
    expect(res.hits.map((h) => h.id)).toContain(id);
  });

  it('ranks the exact tag first when sorted by relevance', async () => {
    const acct = await makeAccount('Relevance');
    const support = await makeUser('support');
    const tag = `RV-${digits()}`;
    const exact = await makeSizingRow(acct.id, support.id, tag);
    await makeSizingRow(acct.id, support.id, `${tag}B`);
    await makeSizingRow(acct.id, support.id, `X${tag}`);
    const res = await searchSizings(support, q({ q: tag, sort: 'relevance' }));
    expect(res.hits).toHaveLength(3);
    expect(res.hits[0]!.id).toBe(exact);
  });
});

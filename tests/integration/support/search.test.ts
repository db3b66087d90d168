import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';
import { toCsv, neutraliseCell } from '@/lib/csv/write';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

const word = () =>
  `kiln${randomUUID()
    .replace(/[^a-f]/g, '')
    .slice(0, 6)}dryer`;
const q = (over: Record<string, unknown>) => supportSearchSchema.parse(over);

describe('support look-up', () => {
  it('finds a sizing from part of its equipment tag, and with a typo', async () => {
    const acct = await makeAccount('Lookup');
    const support = await makeUser('support');
    const engineer = await makeUser('sales_engineer');
    const tagWord = word();
    const id = await makeSizingRow(acct.id, engineer.id, `${tagWord}-301`);
    expect((await searchSizings(support, q({ q: tagWord.slice(0, 9) }))).hits.map((h) => h.id)).toContain(id);
    // one letter dropped from the word: trigram word similarity still matches
    const typo = tagWord.slice(0, 4) + tagWord.slice(5);
    expect((await searchSizings(support, q({ q: typo }))).hits.map((h) => h.id)).toContain(id);
  });

  it('finds by customer name and narrows by service and date', async () => {
    const acct = await makeAccount('Brackwater Maltings');
    const support = await makeUser('support');
    const engineer = await makeUser('sales_engineer');
    const id = await makeSizingRow(acct.id, engineer.id);
    const byName = await searchSizings(
      support,
      q({ q: acct.name.split(' ').slice(0, 2).join(' '), accountId: acct.id }),
    );
    expect(byName.hits.map((h) => h.id)).toEqual([id]);
    expect((await searchSizings(support, q({ accountId: acct.id, service: 'compressor' }))).hits).toHaveLength(0);
    expect((await searchSizings(support, q({ accountId: acct.id, from: '2999-01-01' }))).hits).toHaveLength(0);
    const today = new Date().toISOString().slice(0, 10);
    expect((await searchSizings(support, q({ accountId: acct.id, from: today, to: today }))).total).toBe(1);
  });

  it("never shows a customer another account's sizings", async () => {
    const mine = await makeAccount();
    const other = await makeAccount();
    const engineer = await makeUser('sales_engineer');
    const tagWord = word();
    await makeSizingRow(other.id, engineer.id, `${tagWord}-9`);
    const customer = await makeUser('customer', mine.id);
    expect((await searchSizings(customer, q({ q: tagWord }))).hits).toHaveLength(0);
  });

  it('refuses malformed filters with the field named', () => {
    const bad = supportSearchSchema.safeParse({ minKw: 'lots', from: '03/04/2026' });
    expect(bad.success).toBe(false);
    const paths = bad.error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['minKw', 'from']));
  });
});

describe('CSV written by the product', () => {
  it('neutralises formula-looking text cells and leaves numbers alone', () => {
    expect(neutraliseCell('=HYPERLINK("x")')).toBe(`'=HYPERLINK("x")`);
    expect(neutraliseCell('+1')).toBe("'+1");
    expect(neutraliseCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(neutraliseCell(-12.5)).toBe(-12.5);
    const csv = toCsv(
      ['tag', 'kw'],
      [
        ['-cmd', 3],
        ['EH-1', 4],
      ],
    );
    expect(csv.split('\r\n')).toEqual(['tag,kw', "'-cmd,3", 'EH-1,4']);
  });
});

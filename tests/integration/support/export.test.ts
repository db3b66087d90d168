import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { exportLookupCsv } from '@/lib/support/export';
import { supportSearchSchema } from '@/lib/support/schema';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

const query = (over: Record<string, unknown>) => supportSearchSchema.parse({ ...over, page: 1, pageSize: 100 });
const parse = (csv: string) => Papa.parse<string[]>(csv.trim(), { newline: '\r\n' }).data;

describe('support look-up export', () => {
  it('writes the named columns, one row per hit, with formula-looking text neutralised', async () => {
    const acct = await makeAccount('Export Check');
    const support = await makeUser('support');
    const engineer = await makeUser('sales_engineer');
    await makeSizingRow(acct.id, engineer.id, '=HYPERLINK("x")');
    await makeSizingRow(acct.id, engineer.id, 'E-101');
    const { csv, rows } = await exportLookupCsv(support, query({ accountId: acct.id }));
    const [header, ...body] = parse(csv);
    expect(header).toEqual([
      'sizing',
      'created_utc',
      'customer',
      'title',
      'equipment_tag',
      'service',
      'gas',
      'headline_kw',
      'datasheet',
      'quotes',
      'created_by',
    ]);
    expect(rows).toBe(2);
    expect(body).toHaveLength(2);
    const tags = body.map((r) => r[4]);
    expect(tags).toEqual(expect.arrayContaining(['E-101', `'=HYPERLINK("x")`]));
    expect(body.every((r) => r[2] === acct.name && r[5] === 'heater' && r[7] === '10')).toBe(true);
  });

  it('reads past the first page of 100 hits', async () => {
    const acct = await makeAccount('Export Paging');
    const support = await makeUser('support');
    const engineer = await makeUser('sales_engineer');
    for (let i = 0; i < 101; i++) await makeSizingRow(acct.id, engineer.id, `P-${i}`);
    const { csv, rows } = await exportLookupCsv(support, query({ accountId: acct.id }));
    expect(rows).toBe(101);
    expect(parse(csv)).toHaveLength(102);
  });
});

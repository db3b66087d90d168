import { vi } from 'vitest';

// Thousands of generated uploads from one user: the hourly batch budget is not what is under test here.
vi.hoisted(() => {
  process.env.RATE_LIMIT_BATCH_PER_HOUR = '1000000';
});

import fc from 'fast-check';
import Papa from 'papaparse';
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { actAs } from '../helpers/session';
import { db } from '@/db';
import { sizings } from '@/db/schema';
import { POST as preview } from '@/app/api/v1/batch/preview/route';
import { POST as commit } from '@/app/api/v1/batch/commit/route';
import { batchColumnNames } from '@/lib/batch/columns';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { allFinite } from './arbitraries';

const cell = fc.oneof(
  fc.constantFrom(
    'heater',
    'compressor',
    'air',
    'kg/h',
    'degC',
    'barg',
    '20',
    '-5',
    '1e9',
    'NaN',
    '=cmd|calc',
    '+1',
    '',
    'CH4:0.9;N2:0.1',
    'CH4:x',
  ),
  fc.string({ maxLength: 12 }),
  fc.string({ unit: 'grapheme', maxLength: 6 }),
  fc.double().map(String),
);
const row = fc.dictionary(fc.constantFrom(...batchColumnNames), cell, { maxKeys: batchColumnNames.length });
const sheet = fc.oneof(
  {
    weight: 4,
    arbitrary: fc
      .array(row, { minLength: 0, maxLength: 6 })
      .map((rows) =>
        Papa.unparse({ fields: batchColumnNames, data: rows.map((r) => batchColumnNames.map((c) => r[c] ?? '')) }),
      ),
  },
  { weight: 1, arbitrary: fc.string({ maxLength: 300 }) },
  { weight: 1, arbitrary: fc.uint8Array({ maxLength: 200 }).map((b) => Buffer.from(b).toString('latin1')) },
);
const fileName = fc.oneof(
  fc.constant('enquiry.csv'),
  fc.constantFrom('enquiry.xlsx', 'evil.csv.exe', 'noext', '../../etc/passwd.csv'),
);

function form(text: string, name: string, extra: Record<string, string> = {}) {
  const f = new FormData();
  f.set('file', new File([text], name, { type: name.endsWith('.csv') ? 'text/csv' : 'application/octet-stream' }));
  for (const [k, v] of Object.entries(extra)) f.set(k, v);
  return new Request('http://localhost/api/v1/batch/preview', { method: 'POST', body: f });
}

let accountId = '';
beforeAll(async () => {
  const acct = await makeAccount('Batch fuzz');
  accountId = acct.id;
  await actAs(await makeUser('sales_engineer'));
});

describe('batch upload under hostile input', () => {
  it('answers 10,000 generated uploads with 2xx or 4xx, each problem naming a row and column', async () => {
    await fc.assert(
      fc.asyncProperty(sheet, fileName, async (text, name) => {
        const res = await preview(form(text, name), { params: Promise.resolve({}) });
        expect(res.status).toBeLessThan(500);
        const json = (await res.json()) as {
          rows?: { row: number; problems: { column: string }[]; figures: unknown }[];
        };
        for (const r of json.rows ?? []) {
          expect(r.row).toBeGreaterThanOrEqual(2);
          if (r.figures) expect(allFinite(r.figures)).toBe(true);
          else expect(r.problems.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 10_000 },
    );
  }, 300_000);

  it('stores no row from a sheet whose rows all fail', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(row, { minLength: 1, maxLength: 4 }), async (rows) => {
        const broken = rows.map((r): Record<string, string> => ({ ...r, service: 'boiler' }));
        const text = Papa.unparse({
          fields: batchColumnNames,
          data: broken.map((r) => batchColumnNames.map((c) => r[c] ?? '')),
        });
        const sent = JSON.stringify(broken.map((cells, i) => ({ row: i + 2, cells })));
        const res = await commit(form(text, 'enquiry.csv', { target: JSON.stringify({ accountId }), rows: sent }), {
          params: Promise.resolve({}),
        });
        expect(res.status).toBeGreaterThanOrEqual(400);
        expect(res.status).toBeLessThan(500);
      }),
      { numRuns: 200 },
    );
    expect(await db.select({ id: sizings.id }).from(sizings).where(eq(sizings.accountId, accountId))).toHaveLength(0);
  }, 120_000);

  it('refuses files that are too large or not CSV text', async () => {
    expect(
      (await preview(form('a'.repeat(8 * 1024 * 1024 + 10), 'big.csv'), { params: Promise.resolve({}) })).status,
    ).toBe(413);
    expect((await preview(form('service\nheater', 'sheet.xlsx'), { params: Promise.resolve({}) })).status).toBe(415);
    expect((await preview(form('service\u0000\nheater', 'bin.csv'), { params: Promise.resolve({}) })).status).toBe(415);
  });
});

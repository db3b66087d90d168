import { describe, expect, it } from 'vitest';
import { BATCH_MAX_ROWS, parseBatchCsv } from '@/lib/batch/parse';

const header = 'service,title,flow_value,flow_unit';

describe('reading a batch sheet', () => {
  it('reads a sheet whose lines mix CRLF and LF without merging rows', () => {
    const text = `${header}\r\nheater,First heater,100,kg/h\nheater,Second heater,200,kg/h\r\nheater,Third heater,300,kg/h\n`;
    const sheet = parseBatchCsv(text);
    expect(sheet.problems).toEqual([]);
    expect(sheet.rows.map((r) => r.cells.title)).toEqual(['First heater', 'Second heater', 'Third heater']);
    expect(sheet.rows.map((r) => r.cells.flow_unit)).toEqual(['kg/h', 'kg/h', 'kg/h']);
  });

  it('reads a header that ends in CRLF when the rows end in LF (and old Mac CR)', () => {
    const sheet = parseBatchCsv(`${header}\r\nheater,One,1,kg/h\rheater,Two,2,kg/h`);
    expect(sheet.problems).toEqual([]);
    expect(sheet.rows).toHaveLength(2);
  });

  it('numbers rows by their line in the file: comments, blank lines and quoted line breaks counted', () => {
    const text = [
      header, // line 1
      '# hints row', // 2
      'heater,Line three,1,kg/h', // 3
      '', // 4
      'heater,"Two-line', // 5
      'title",2,kg/h', // 6
      'heater,Line seven,3,kg/h', // 7
    ].join('\r\n');
    const sheet = parseBatchCsv(text);
    expect(sheet.rows.map((r) => [r.row, r.cells.title])).toEqual([
      [3, 'Line three'],
      [5, 'Two-line\ntitle'],
      [7, 'Line seven'],
    ]);
  });

  it('refuses unknown columns, a sheet without service, and more rows than the limit', () => {
    expect(parseBatchCsv('service,colour\nheater,blue').problems.join(' ')).toMatch(/Unknown columns: colour/);
    expect(parseBatchCsv('title\nx').problems.join(' ')).toMatch(/no "service" column/);
    const big = [header, ...Array.from({ length: BATCH_MAX_ROWS + 1 }, (_, i) => `heater,H ${i},1,kg/h`)].join('\n');
    expect(parseBatchCsv(big).problems.join(' ')).toMatch(/10,001 duty points; the limit is 10,000/);
    expect(parseBatchCsv('').problems.join(' ')).toMatch(/empty/);
  });
});

import { toCsv } from '@/lib/csv/write';
import { batchColumnNames, batchColumns } from './columns';

/** The downloadable template: header, a row of hints, and one example row per service. */
export function batchTemplateCsv(): string {
  const hints = batchColumns.map((c) => `# ${c.hint}`);
  hints[0] = `# ${batchColumns[0]?.hint ?? ''} (rows starting with # are ignored)`;
  return toCsv(batchColumnNames, [
    hints,
    batchColumns.map((c) => c.example.heater),
    batchColumns.map((c) => c.example.compressor),
  ]).replace(/'#/g, '#');
}

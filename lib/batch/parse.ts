import Papa from 'papaparse';
import { batchColumnNames } from './columns';
import type { BatchCells } from './row-to-request';

// Client-safe: the batch desk reads the sheet in the browser (to check it in chunks with progress) and the
// handlers read it on the server with the same code, so both number the rows alike.

/** The most duty points one sheet may hold. */
export const BATCH_MAX_ROWS = 10_000;
/** Rows the desk sends to be checked in one request, so progress can be shown between requests. */
export const BATCH_CHECK_CHUNK = 500;
/** The most rows one check request may carry. */
export const BATCH_CHECK_MAX_ROWS = 1_000;

/** One duty point and the line of the file it starts on, as a spreadsheet numbers it (the header is line 1). */
export type SheetRow = { row: number; cells: BatchCells };
export type ParsedSheet = { rows: SheetRow[]; problems: string[] };

/**
 * Reads CSV text into rows keyed by the template's column names. Line endings are made uniform first (a sheet
 * edited on two systems mixes CRLF and LF); blank lines and rows whose first cell starts with '#' are skipped
 * but still counted, so every row keeps its line number in the file.
 */
export function parseBatchCsv(text: string): ParsedSheet {
  const uniform = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  const parsed = Papa.parse<string[]>(uniform, { header: false, skipEmptyLines: false, newline: '\n' });
  const records = parsed.data;
  const problems: string[] = [];
  const headerIndex = records.findIndex((r) => r.some((c) => c.trim() !== ''));
  const headers = (records[headerIndex] ?? []).map((h) => h.trim().toLowerCase());
  const unknown = headers.filter((h) => h && !batchColumnNames.includes(h));
  if (unknown.length)
    problems.push(`Unknown columns: ${unknown.join(', ')}. Download the template for the expected names.`);
  if (!headers.includes('service'))
    problems.push('The sheet has no "service" column; download the template for the expected layout.');
  const rows: SheetRow[] = [];
  let line = 1;
  records.forEach((record, i) => {
    const startLine = line;
    // A quoted cell may hold line breaks: the next record starts that many lines further down.
    line += 1 + record.reduce((n, cell) => n + (cell.match(/\n/g)?.length ?? 0), 0);
    if (i <= headerIndex) return;
    if (record.every((c) => c.trim() === '')) return;
    if ((record[0] ?? '').trim().startsWith('#')) return;
    const cells: BatchCells = {};
    headers.forEach((h, col) => {
      if (h) cells[h] = record[col] ?? '';
    });
    rows.push({ row: startLine, cells });
  });
  if (rows.length > BATCH_MAX_ROWS)
    problems.push(
      `The sheet has ${rows.length.toLocaleString('en-US')} duty points; the limit is ${BATCH_MAX_ROWS.toLocaleString('en-US')} a batch.`,
    );
  if (!rows.length && headerIndex >= 0) problems.push('The sheet has no duty points.');
  if (headerIndex < 0) problems.push('The sheet is empty.');
  return { rows: rows.slice(0, BATCH_MAX_ROWS), problems };
}

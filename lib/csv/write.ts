import Papa from 'papaparse';

// Spreadsheet programs execute cells that start with these characters as formulas (CSV injection).
const FORMULA_START = /^[=+\-@\t\r]/;

/** Makes a text cell safe to open in a spreadsheet: a leading formula character gets an apostrophe. Numbers pass as they are. */
export function neutraliseCell(value: unknown): string | number {
  if (typeof value === 'number') return Number.isFinite(value) ? value : '';
  if (value === null || value === undefined) return '';
  const s = String(value);
  return FORMULA_START.test(s) ? `'${s}` : s;
}

/** CSV text with a header row; every text cell neutralised. */
export function toCsv(columns: string[], rows: unknown[][]): string {
  return Papa.unparse(
    { fields: columns.map((c) => String(neutraliseCell(c))), data: rows.map((r) => r.map(neutraliseCell)) },
    { newline: '\r\n' },
  );
}

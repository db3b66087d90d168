import Papa from 'papaparse';
import {
  calculateCore,
  sizingRequestSchema,
  SizingInputError,
  type SizingInput,
  type SizingResult,
} from '@/lib/engine';
import { issuesOf } from '@/lib/errors';
import { batchColumnNames, columnForPath } from './columns';
import { rowToRequest, type BatchCells, type RowProblem } from './row-to-request';

export const BATCH_MAX_ROWS = 2_000;

export type BatchRow = {
  row: number;
  cells: BatchCells;
  meta: { title: string; equipmentTag?: string; notes?: string };
  problems: RowProblem[];
  input: SizingInput | null;
  result: SizingResult | null;
};

export type ParsedSheet = { rows: BatchCells[]; problems: string[] };

/** Reads CSV text into cell maps keyed by the template's column names; '#' rows are comments. */
export function parseBatchCsv(text: string): ParsedSheet {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const problems: string[] = [];
  const headers = parsed.meta.fields ?? [];
  const unknown = headers.filter((h) => h && !batchColumnNames.includes(h));
  if (unknown.length)
    problems.push(`Unknown columns: ${unknown.join(', ')}. Download the template for the expected names.`);
  if (!headers.includes('service'))
    problems.push('The sheet has no "service" column; download the template for the expected layout.');
  const rows = parsed.data.filter(
    (r) =>
      !String(Object.values(r)[0] ?? '')
        .trim()
        .startsWith('#'),
  );
  if (rows.length > BATCH_MAX_ROWS)
    problems.push(`The sheet has ${rows.length} duty points; the limit is ${BATCH_MAX_ROWS} a batch.`);
  if (!rows.length) problems.push('The sheet has no duty points.');
  return {
    rows: rows
      .slice(0, BATCH_MAX_ROWS)
      .map((r) => Object.fromEntries(Object.entries(r).map(([k, v]) => [k, String(v ?? '')]))),
    problems,
  };
}

/** Validates one row with the engine's schema and sizes it when valid; every problem names its column. */
export function evaluateRow(cells: BatchCells, row: number): BatchRow {
  const { request, meta, problems } = rowToRequest(cells);
  if (!meta.title || meta.title.trim().length < 3)
    problems.push({ column: 'title', message: 'give a title of 3 to 160 characters' });
  if (meta.equipmentTag && meta.equipmentTag.length > 60)
    problems.push({ column: 'equipment_tag', message: 'at most 60 characters' });
  const parsed = sizingRequestSchema.safeParse(request);
  // A cell already reported as unreadable is not reported again as missing.
  const reported = new Set(problems.map((p) => p.column));
  if (!parsed.success) {
    for (const i of issuesOf(parsed.error)) {
      const column = columnForPath(i.path);
      if (!reported.has(column)) problems.push({ column, message: i.message });
    }
  }
  if (problems.length || !parsed.success)
    return { row, cells, meta, problems: dedupe(problems), input: null, result: null };
  try {
    return { row, cells, meta, problems: [], input: parsed.data, result: calculateCore(parsed.data) };
  } catch (err) {
    if (err instanceof SizingInputError)
      return {
        row,
        cells,
        meta,
        problems: err.issues.map((i) => ({ column: columnForPath(i.path), message: i.message })),
        input: null,
        result: null,
      };
    throw err;
  }
}

function dedupe(list: RowProblem[]): RowProblem[] {
  const seen = new Set<string>();
  return list.filter((p) => (seen.has(p.column + p.message) ? false : (seen.add(p.column + p.message), true)));
}

/** Evaluates a whole sheet; rows are numbered as a spreadsheet shows them (header is row 1). */
export function evaluateSheet(rows: BatchCells[]): BatchRow[] {
  return rows.map((cells, i) => evaluateRow(cells, i + 2));
}

import {
  calculateCore,
  sizingRequestSchema,
  SizingInputError,
  type SizingInput,
  type SizingResult,
} from '@/lib/engine';
import { issuesOf } from '@/lib/errors';
import { columnForPath } from './columns';
import type { SheetRow } from './parse';
import { rowToRequest, type BatchCells, type RowProblem } from './row-to-request';

export type BatchRow = {
  row: number;
  cells: BatchCells;
  meta: { title: string; equipmentTag?: string; notes?: string };
  problems: RowProblem[];
  input: SizingInput | null;
  result: SizingResult | null;
};

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

/** Evaluates rows of a sheet; each keeps the line number it has in the file. */
export function evaluateSheet(rows: readonly SheetRow[]): BatchRow[] {
  return rows.map((r) => evaluateRow(r.cells, r.row));
}

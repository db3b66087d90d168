import 'server-only';
import { z } from 'zod';
import { ActionError } from '@/lib/actions/define-action';
import { BATCH_CHECK_MAX_ROWS, BATCH_MAX_ROWS, parseBatchCsv, type SheetRow } from './parse';
import { batchTargetSchema, type BatchTarget } from './schema';
import { BATCH_MAX_BYTES, checkUpload, describeLimit, looksLikeText } from './upload-limits';

const sheetRowSchema = z.object({
  row: z.number().int().min(2).max(10_000_000),
  cells: z.record(z.string().max(40), z.string().max(400)),
});
const rowsSchema = (max: number) => z.array(sheetRowSchema).max(max);

export type BatchFile = { name: string; type: string; bytes: Buffer };

async function readForm(req: Request, maxBytes: number): Promise<FormData> {
  const length = Number(req.headers.get('content-length') ?? '0');
  if (length > maxBytes) throw new ActionError(`The upload is larger than the ${describeLimit()} limit.`, 413);
  try {
    return await req.formData();
  } catch {
    throw new ActionError('Send the CSV as multipart/form-data with a "file" field.', 400);
  }
}

async function readFile(form: FormData): Promise<BatchFile> {
  const file = form.get('file');
  if (!(file instanceof File)) throw new ActionError('Attach the CSV file in the "file" field.', 400);
  const check = checkUpload(file);
  if (!check.ok) throw new ActionError(check.message, check.status);
  const bytes = Buffer.from(await file.arrayBuffer());
  if (!looksLikeText(bytes))
    throw new ActionError('The file is not UTF-8 text; save the spreadsheet as "CSV UTF-8".', 415);
  return { name: file.name.slice(0, 200), type: file.type || 'text/csv', bytes };
}

function rowsField(raw: FormDataEntryValue | unknown, max: number, what: string): SheetRow[] {
  const parsed = rowsSchema(max).safeParse(typeof raw === 'string' ? safeJson(raw) : raw);
  if (!parsed.success)
    throw new ActionError(
      `${what} must be a list of at most ${max.toLocaleString('en-US')} {row, cells} objects.`,
      400,
    );
  return parsed.data;
}

/** Rows to check: a JSON chunk {rows: [{row, cells}]} from the desk, or a whole CSV file (multipart "file"). */
export async function readBatchCheck(req: Request): Promise<{ rows: SheetRow[]; problems: string[] }> {
  if ((req.headers.get('content-type') ?? '').includes('application/json')) {
    const length = Number(req.headers.get('content-length') ?? '0');
    if (length > 4 * 1024 * 1024) throw new ActionError('Send at most 4 MiB of rows a request.', 413);
    const body = safeJson(await req.text()) as { rows?: unknown } | null;
    return { rows: rowsField(body?.rows, BATCH_CHECK_MAX_ROWS, 'The "rows" field'), problems: [] };
  }
  const file = await readFile(await readForm(req, BATCH_MAX_BYTES + 64 * 1024));
  return parseBatchCsv(file.bytes.toString('utf8'));
}

/** A save: the original file (kept as uploaded), the rows that passed the last check, and where they go. */
export async function readBatchCommit(
  req: Request,
): Promise<{ file: BatchFile; sheetRows: number; rows: SheetRow[]; target: string | null }> {
  const form = await readForm(req, 3 * BATCH_MAX_BYTES + 64 * 1024);
  const file = await readFile(form);
  const sheet = parseBatchCsv(file.bytes.toString('utf8'));
  if (sheet.problems.length) throw new ActionError(sheet.problems.join(' '), 422);
  const rows = rowsField(form.get('rows'), BATCH_MAX_ROWS, 'The "rows" field');
  if (!rows.length) throw new ActionError('No checked row was sent: check the sheet, then save.', 422);
  const target = form.get('target');
  return { file, sheetRows: sheet.rows.length, rows, target: typeof target === 'string' ? target : null };
}

/** Reads the request's "target" field (JSON) as a BatchTarget; a 400 naming the field when it is missing or wrong. */
export function parseBatchTarget(raw: string | null): BatchTarget {
  const parsed = batchTargetSchema.safeParse(raw ? safeJson(raw) : null);
  if (!parsed.success)
    throw new ActionError('Say where to save: the "target" field needs a customer account.', 400, {
      target: parsed.error.issues.map((i) => i.message),
    });
  return parsed.data;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

import 'server-only';
import { z } from 'zod';
import { AppError, invalidInput } from '@/lib/errors';
import { readBodyLimited } from '@/lib/http/read-limited';
import { BATCH_CHECK_MAX_ROWS, BATCH_MAX_ROWS, parseBatchCsv, type SheetRow } from './parse';
import { batchTargetSchema, type BatchTarget } from './schema';
import { BATCH_MAX_BYTES, checkUpload, describeLimit, looksLikeText } from './upload-limits';

const sheetRowSchema = z.object({
  row: z.number().int().min(2).max(10_000_000),
  cells: z.record(z.string().max(40), z.string().max(400)),
});
const rowsSchema = (max: number) => z.array(sheetRowSchema).max(max);

export type BatchFile = { name: string; type: string; bytes: Buffer };

/** Reads a body with a cap while it arrives (chunked uploads included): 413 past it, 400 when cut short. */
async function readCapped(req: Request, maxBytes: number, tooLarge: string): Promise<Uint8Array> {
  const read = await readBodyLimited(req, maxBytes);
  if (!read.ok && read.reason === 'too-large') throw new AppError('too_large', tooLarge);
  if (!read.ok) throw new AppError('invalid_input', 'The upload could not be read completely; send it again.');
  return read.bytes;
}

async function readForm(req: Request, maxBytes: number): Promise<FormData> {
  const bytes = await readCapped(req, maxBytes, `The upload is larger than the ${describeLimit()} limit.`);
  try {
    const type = req.headers.get('content-type') ?? '';
    return await new Response(Buffer.from(bytes), { headers: { 'content-type': type } }).formData();
  } catch {
    throw new AppError('invalid_input', 'Send the CSV as multipart/form-data with a "file" field.');
  }
}

async function readFile(form: FormData): Promise<BatchFile> {
  const file = form.get('file');
  if (!(file instanceof File)) throw new AppError('invalid_input', 'Attach the CSV file in the "file" field.');
  const check = checkUpload(file);
  if (!check.ok) throw new AppError(check.code, check.message);
  const bytes = Buffer.from(await file.arrayBuffer());
  if (!looksLikeText(bytes))
    throw new AppError('unsupported_type', 'The file is not UTF-8 text; save the spreadsheet as "CSV UTF-8".');
  return { name: file.name.slice(0, 200), type: file.type || 'text/csv', bytes };
}

function rowsField(raw: FormDataEntryValue | unknown, max: number, what: string): SheetRow[] {
  const parsed = rowsSchema(max).safeParse(typeof raw === 'string' ? safeJson(raw) : raw);
  if (!parsed.success)
    throw new AppError(
      'invalid_input',
      `${what} must be a list of at most ${max.toLocaleString('en-US')} {row, cells} objects.`,
    );
  return parsed.data;
}

/** Rows to check: a JSON chunk {rows: [{row, cells}]} from the desk, or a whole CSV file (multipart "file"). */
export async function readBatchCheck(req: Request): Promise<{ rows: SheetRow[]; problems: string[] }> {
  if ((req.headers.get('content-type') ?? '').includes('application/json')) {
    const bytes = await readCapped(req, 4 * 1024 * 1024, 'Send at most 4 MiB of rows a request.');
    const body = safeJson(new TextDecoder().decode(bytes)) as { rows?: unknown } | null;
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
  if (sheet.problems.length) throw sheetProblems(sheet.problems);
  const rows = rowsField(form.get('rows'), BATCH_MAX_ROWS, 'The "rows" field');
  if (!rows.length) throw new AppError('unprocessable', 'No checked row was sent: check the sheet, then save.');
  const target = form.get('target');
  return { file, sheetRows: sheet.rows.length, rows, target: typeof target === 'string' ? target : null };
}

/** Reads the request's "target" field (JSON) as a BatchTarget; a 400 naming the field when it is missing or wrong. */
export function parseBatchTarget(raw: string | null): BatchTarget {
  const parsed = batchTargetSchema.safeParse(raw ? safeJson(raw) : null);
  if (!parsed.success)
    throw new AppError(
      'invalid_input',
      'Say where to save: the "target" field needs a customer account.',
      parsed.error.issues.map((i) => ({ path: 'target', message: i.message })),
    );
  return parsed.data;
}

/** A sheet that cannot be read as a batch at all (no header, no rows): 422 with each problem on "file". */
export function sheetProblems(problems: string[]): AppError {
  return invalidInput(
    problems.map((message) => ({ path: 'file', message })),
    'unprocessable',
  );
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

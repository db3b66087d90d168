import 'server-only';
import { z } from 'zod';
import { AppError, invalidInput } from '@/lib/errors';
import { readBodyLimited } from '@/lib/http/read-limited';
import { BATCH_MAX_ROWS, parseBatchCsv, type ParsedSheet } from './evaluate';
import { batchTargetSchema, type BatchTarget } from './schema';
import { BATCH_REQUEST_MAX_BYTES, checkUpload, looksLikeText } from './upload-limits';

const cellsSchema = z.array(z.record(z.string().max(40), z.string().max(400))).max(BATCH_MAX_ROWS);

export type BatchUpload = {
  sheet: ParsedSheet;
  file: { name: string; type: string; bytes: Buffer };
  target: string | null;
};

/** Reads the multipart batch request: the original CSV, and optionally the user's edited rows (JSON). */
export async function readBatchRequest(req: Request): Promise<BatchUpload> {
  // The whole request (file, edited rows, target) is read with a cap, then parsed from memory.
  const read = await readBodyLimited(req, BATCH_REQUEST_MAX_BYTES);
  if (!read.ok && read.reason === 'too-large')
    throw new AppError('too_large', 'The upload is larger than the 2 MiB limit.');
  if (!read.ok) throw new AppError('invalid_input', 'The upload could not be read completely; send it again.');
  let form: FormData;
  try {
    const type = req.headers.get('content-type') ?? '';
    form = await new Response(Buffer.from(read.bytes), { headers: { 'content-type': type } }).formData();
  } catch {
    throw new AppError('invalid_input', 'Send the CSV as multipart/form-data with a "file" field.');
  }
  const file = form.get('file');
  if (!(file instanceof File)) throw new AppError('invalid_input', 'Attach the CSV file in the "file" field.');
  const check = checkUpload(file);
  if (!check.ok) throw new AppError(check.code, check.message);
  const bytes = Buffer.from(await file.arrayBuffer());
  if (!looksLikeText(bytes))
    throw new AppError('unsupported_type', 'The file is not UTF-8 text; save the spreadsheet as "CSV UTF-8".');
  const edited = form.get('rows');
  let sheet = parseBatchCsv(bytes.toString('utf8'));
  if (typeof edited === 'string' && edited.length) {
    const parsed = cellsSchema.safeParse(safeJson(edited));
    if (!parsed.success) throw new AppError('invalid_input', 'The edited rows are not in the expected shape.');
    sheet = { rows: parsed.data, problems: sheet.problems.filter((p) => !/no duty points/.test(p)) };
  }
  const target = form.get('target');
  return {
    sheet,
    file: { name: file.name.slice(0, 200), type: file.type || 'text/csv', bytes },
    target: typeof target === 'string' ? target : null,
  };
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

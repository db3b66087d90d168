// What a batch upload may be: a CSV of at most 8 MiB (10,000 duty points of the template run to about
// 3 MiB). Anything else is refused before it is read.
import type { ErrorCode } from '@/lib/errors';

export const BATCH_MAX_BYTES = 8 * 1024 * 1024;
const allowedTypes = new Set(['text/csv', 'application/csv', 'text/plain', 'application/vnd.ms-excel', '']);

export type UploadCheck =
  | { ok: true }
  | { ok: false; code: Extract<ErrorCode, 'too_large' | 'unsupported_type' | 'invalid_input'>; message: string };

/** "8 MiB" */
export function describeLimit(): string {
  return `${BATCH_MAX_BYTES / 1048576} MiB`;
}

export function checkUpload(file: { name: string; type: string; size: number }): UploadCheck {
  if (file.size === 0) return { ok: false, code: 'invalid_input', message: 'The file is empty.' };
  if (file.size > BATCH_MAX_BYTES)
    return {
      ok: false,
      code: 'too_large',
      message: `The file is ${(file.size / 1048576).toFixed(1)} MiB; the limit is ${describeLimit()}.`,
    };
  if (!/\.csv$/i.test(file.name) || !allowedTypes.has(file.type))
    return { ok: false, code: 'unsupported_type', message: 'Upload a .csv file (save the spreadsheet as CSV UTF-8).' };
  return { ok: true };
}

/** Bytes that are not text (NUL, or invalid UTF-8) mean a binary file renamed to .csv. */
export function looksLikeText(bytes: Uint8Array): boolean {
  if (bytes.includes(0)) return false;
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return true;
  } catch {
    return false;
  }
}

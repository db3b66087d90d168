import 'server-only';
import { AppError } from '@/lib/errors';
import { readBodyLimited, sizeLabel } from './read-limited';

/**
 * Reads a JSON body, stopping at `maxBytes` while it arrives (chunked bodies included); a body too large,
 * cut short or not JSON is an AppError naming the problem.
 */
export async function readJsonBody(req: Request, maxBytes: number): Promise<unknown> {
  const body = await readBodyLimited(req, maxBytes);
  if (!body.ok)
    throw body.reason === 'too-large'
      ? tooLarge(maxBytes)
      : new AppError('invalid_input', 'The request body could not be read completely.');
  try {
    return JSON.parse(new TextDecoder().decode(body.bytes));
  } catch {
    throw new AppError('invalid_input', 'The request body is not valid JSON.');
  }
}

/** 413 naming the limit. */
export function tooLarge(maxBytes: number): AppError {
  return new AppError('too_large', `The request body is larger than ${sizeLabel(maxBytes)}.`);
}

import 'server-only';
import { AppError } from '@/lib/errors';

/** Reads a JSON body with a size cap; a body too large, cut short or not JSON is an AppError naming the problem. */
export async function readJsonBody(req: Request, maxBytes: number): Promise<unknown> {
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > maxBytes) throw tooLarge(maxBytes);
  let text: string;
  try {
    text = await req.text();
  } catch {
    // A client that gives up mid-body (a superseded request) sent nothing usable.
    throw new AppError('invalid_input', 'The request body could not be read completely.');
  }
  if (Buffer.byteLength(text) > maxBytes) throw tooLarge(maxBytes);
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError('invalid_input', 'The request body is not valid JSON.');
  }
}

function tooLarge(maxBytes: number): AppError {
  return new AppError('too_large', `The request body is larger than ${Math.round(maxBytes / 1024)} KiB.`);
}

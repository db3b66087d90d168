import 'server-only';
import type { z } from 'zod';

export type ApiFieldError = { path: string; message: string };

/** Reads a JSON body with a size cap; answers with the problem instead of throwing. */
export async function readJsonBody(
  req: Request,
  maxBytes: number,
): Promise<{ ok: true; value: unknown } | { ok: false; response: Response }> {
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > maxBytes) return { ok: false, response: tooLarge(maxBytes) };
  let text: string;
  try {
    text = await req.text();
  } catch {
    // A client that gives up mid-body (a superseded request) sent nothing usable.
    return {
      ok: false,
      response: Response.json(
        { errors: [{ path: '', message: 'The request body could not be read completely.' }] },
        { status: 400 },
      ),
    };
  }
  if (Buffer.byteLength(text) > maxBytes) return { ok: false, response: tooLarge(maxBytes) };
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch {
    return {
      ok: false,
      response: Response.json(
        { errors: [{ path: '', message: 'The request body is not valid JSON.' }] },
        { status: 400 },
      ),
    };
  }
}

function tooLarge(maxBytes: number): Response {
  return Response.json(
    { errors: [{ path: '', message: `The request body is larger than ${Math.round(maxBytes / 1024)} KiB.` }] },
    { status: 413 },
  );
}

export function zodErrors(error: z.ZodError): ApiFieldError[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
}

export function tooManyRequests(retryAfterS: number, what: string, headers: Record<string, string> = {}): Response {
  return Response.json(
    { errors: [{ path: '', message: `Too many ${what}; try again in ${retryAfterS} s.` }] },
    { status: 429, headers: { ...headers, 'Retry-After': String(retryAfterS) } },
  );
}

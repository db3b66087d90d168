import 'server-only';
import type { z } from 'zod';
import { readBodyLimited, sizeLabel } from './read-limited';

export type ApiFieldError = { path: string; message: string };

/** Reads a JSON body, stopping at `maxBytes` (413); answers with the problem instead of throwing. */
export async function readJsonBody(
  req: Request,
  maxBytes: number,
): Promise<{ ok: true; value: unknown } | { ok: false; response: Response }> {
  const body = await readBodyLimited(req, maxBytes);
  if (!body.ok)
    return {
      ok: false,
      response:
        body.reason === 'too-large'
          ? tooLarge(maxBytes)
          : Response.json(
              { errors: [{ path: '', message: 'The request body could not be read completely.' }] },
              { status: 400 },
            ),
    };
  try {
    return { ok: true, value: JSON.parse(new TextDecoder().decode(body.bytes)) };
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

/** 413 naming the limit. */
export function tooLarge(maxBytes: number): Response {
  return Response.json(
    { errors: [{ path: '', message: `The request body is larger than ${sizeLabel(maxBytes)}.` }] },
    { status: 413 },
  );
}

export function zodErrors(error: z.ZodError): ApiFieldError[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
}

export function tooManyRequests(retryAfterS: number, what: string): Response {
  return Response.json(
    { errors: [{ path: '', message: `Too many ${what}; try again in ${retryAfterS} s.` }] },
    { status: 429, headers: { 'Retry-After': String(retryAfterS) } },
  );
}

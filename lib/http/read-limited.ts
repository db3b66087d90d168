import 'server-only';

export type LimitedBody = { ok: true; bytes: Uint8Array } | { ok: false; reason: 'too-large' | 'unreadable' };

/**
 * Reads a request body up to `maxBytes`, counting bytes as they arrive: a declared Content-Length over the limit is
 * refused before reading, and a body without one (chunked) is cut off as soon as it passes the limit, so no
 * more than the limit plus one chunk is ever held. The rest of the stream is cancelled, not read.
 */
export async function readBodyLimited(req: Request, maxBytes: number): Promise<LimitedBody> {
  const declared = Number(req.headers.get('content-length') ?? '');
  if (Number.isFinite(declared) && declared > maxBytes) {
    await req.body?.cancel().catch(() => undefined);
    return { ok: false, reason: 'too-large' };
  }
  if (!req.body) return { ok: true, bytes: new Uint8Array(0) };
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > maxBytes) {
        await reader.cancel().catch(() => undefined);
        return { ok: false, reason: 'too-large' };
      }
      chunks.push(value);
    }
  } catch {
    // A client that gives up mid-body (a superseded request) sent nothing usable.
    return { ok: false, reason: 'unreadable' };
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return { ok: true, bytes: out };
}

/** Human size of a limit for messages: "64 KiB", "2 MiB". */
export function sizeLabel(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.round(bytes / 1048576)} MiB` : `${Math.round(bytes / 1024)} KiB`;
}

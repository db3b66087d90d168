// Decodes an `aws-chunked` upload body (hex size, optional chunk signature, data, CRLF; a zero chunk and
// trailers end it), which SDKs send when they stream a checksum trailer.
export function decodeAwsChunked(body: Uint8Array): Uint8Array {
  const parts: Uint8Array[] = [];
  const text = new TextDecoder('latin1');
  let pos = 0;
  for (;;) {
    let eol = pos;
    while (eol + 1 < body.length && !(body[eol] === 0x0d && body[eol + 1] === 0x0a)) eol++;
    if (eol + 1 >= body.length) throw new Error('aws-chunked body ends inside a chunk header');
    const header = text.decode(body.subarray(pos, eol));
    const size = Number.parseInt(header.split(';')[0] ?? '', 16);
    if (!Number.isFinite(size) || size < 0) throw new Error(`aws-chunked chunk header "${header}" has no size`);
    if (size === 0) break;
    const start = eol + 2;
    parts.push(body.subarray(start, start + size));
    pos = start + size + 2;
  }
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

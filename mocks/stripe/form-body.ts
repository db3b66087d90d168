import type { IncomingMessage } from 'node:http';

export type FormValue = string | FormValue[] | { [key: string]: FormValue };
export type FormObject = { [key: string]: FormValue };

// Generous for a checkout form, small enough that a runaway client cannot exhaust memory.
const MAX_BODY_BYTES = 256 * 1024;
const MAX_DEPTH = 6;
const MAX_INDEX = 999;

/** Thrown for bodies or keys the fake cannot read; the server answers 400. */
export class FormParseError extends Error {}

/** Reads the whole request body as UTF-8, refusing bodies over the size limit. */
export async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    const buf = Buffer.isBuffer(chunk) ? chunk : Buffer.from(String(chunk));
    size += buf.length;
    if (size > MAX_BODY_BYTES) throw new FormParseError(`Request body is larger than ${MAX_BODY_BYTES} bytes.`);
    chunks.push(buf);
  }
  return Buffer.concat(chunks).toString('utf8');
}

function splitKey(rawKey: string): string[] {
  const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(rawKey);
  if (!match || match[1] === undefined) throw new FormParseError(`Invalid parameter name: ${rawKey}`);
  const rest = match[2] ?? '';
  const segments = [match[1], ...Array.from(rest.matchAll(/\[([^[\]]*)\]/g), (m) => m[1] ?? '')];
  if (segments.length > MAX_DEPTH) throw new FormParseError(`Parameter nested too deeply: ${rawKey}`);
  return segments;
}

type Draft = string | { [key: string]: Draft };

function assign(target: { [key: string]: Draft }, path: string[], value: string, rawKey: string): void {
  let node = target;
  path.forEach((segment, i) => {
    // An empty segment (`a[]=x`) appends, as browsers and most form libraries expect.
    const key = segment === '' ? String(Object.keys(node).length) : segment;
    if (i === path.length - 1) {
      if (typeof node[key] === 'object') throw new FormParseError(`Parameter ${rawKey} is both a value and a hash.`);
      node[key] = value;
      return;
    }
    const next = node[key];
    if (typeof next === 'string') throw new FormParseError(`Parameter ${rawKey} is both a value and a hash.`);
    const child: { [key: string]: Draft } = next ?? {};
    node[key] = child;
    node = child;
  });
}

function finalize(draft: Draft, rawPath: string): FormValue {
  if (typeof draft === 'string') return draft;
  const keys = Object.keys(draft);
  const indexed = keys.length > 0 && keys.every((k) => /^\d+$/.test(k));
  if (!indexed) {
    const out: FormObject = {};
    for (const k of keys) out[k] = finalize(draft[k] as Draft, `${rawPath}[${k}]`);
    return out;
  }
  const indices = keys.map(Number).sort((a, b) => a - b);
  if ((indices.at(-1) ?? 0) > MAX_INDEX) throw new FormParseError(`Index too large in ${rawPath}.`);
  // Stripe's SDK sends dense arrays from 0; holes would mean a lost item, so refuse them.
  if (indices.some((n, i) => n !== i))
    throw new FormParseError(`Array ${rawPath} must be indexed 0, 1, 2 ... without gaps.`);
  return indices.map((n) => finalize(draft[String(n)] as Draft, `${rawPath}[${n}]`));
}

/** Parses Stripe-style form keys (`line_items[0][price]=x`) into nested objects and arrays. */
export function parseForm(text: string): FormObject {
  const root: { [key: string]: Draft } = {};
  for (const [rawKey, value] of new URLSearchParams(text)) {
    assign(root, splitKey(rawKey), value, rawKey);
  }
  const out: FormObject = {};
  for (const key of Object.keys(root)) out[key] = finalize(root[key] as Draft, key);
  return out;
}

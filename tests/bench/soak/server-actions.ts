// Calls the app's server actions over HTTP exactly as the browser does: a POST to a page that renders the
// action, with its id in the Next-Action header and the arguments as the JSON text React sends for plain
// objects. Ids come from the build's server-reference manifest, so the soak drives the real code path.
import { readFileSync } from 'node:fs';
import path from 'node:path';

type ManifestEntry = { workers: Record<string, unknown>; filename?: string; exportedName?: string };
type Manifest = { node: Record<string, ManifestEntry> };

export type ActionRef = { id: string; pagePath: string };

/** Finds `exportedName` of `file` in the build; the page it posts to has its dynamic segments filled from `params`. */
export function findAction(distDir: string, file: string, exportedName: string, params: Record<string, string> = {}) {
  const manifest = JSON.parse(
    readFileSync(path.join(distDir, 'server', 'server-reference-manifest.json'), 'utf8'),
  ) as Manifest;
  for (const [id, entry] of Object.entries(manifest.node)) {
    if (entry.filename !== file || entry.exportedName !== exportedName) continue;
    // Prefer a page without dynamic segments; otherwise fill them in.
    const workers = Object.keys(entry.workers).sort((a, b) => Number(a.includes('[')) - Number(b.includes('[')));
    const worker = workers[0];
    if (!worker) break;
    const pagePath =
      worker
        .replace(/^app/, '')
        .replace(/\/page$/, '')
        .replace(/\/\([^)]+\)/g, '')
        .replace(/\[(\w+)\]/g, (_, name: string) => params[name] ?? name) || '/';
    return { id, pagePath } satisfies ActionRef;
  }
  throw new Error(`server action ${file}#${exportedName} is not in the build at ${distDir}; build it first`);
}

export type ActionOutcome = { ok: boolean; status: number; data?: unknown; error?: string };

/** Posts one call; `ok` is the action's own `ok` (defineAction's result), not just the HTTP status. */
export async function callAction(base: string, ref: ActionRef, arg: unknown, cookie: string): Promise<ActionOutcome> {
  const res = await fetch(`${base}${ref.pagePath}`, {
    method: 'POST',
    headers: {
      'next-action': ref.id,
      'content-type': 'text/plain;charset=UTF-8',
      accept: 'text/x-component',
      origin: base,
      cookie,
    },
    body: JSON.stringify([arg]),
    signal: AbortSignal.timeout(30_000),
  });
  const text = await res.text();
  if (!res.ok) return { ok: false, status: res.status, error: text.slice(0, 200) };
  // The flight answer holds the returned value on one of its "<id>:<json>" lines.
  for (const line of text.split('\n')) {
    const m = /^[0-9a-f]+:(\{.*\})$/.exec(line);
    if (!m) continue;
    const value = JSON.parse(m[1]!) as {
      ok?: boolean;
      data?: unknown;
      errors?: { message: string }[];
      status?: number;
    };
    if (typeof value.ok === 'boolean')
      return value.ok
        ? { ok: true, status: res.status, data: value.data }
        : {
            ok: false,
            status: value.status ?? res.status,
            error: value.errors?.map((e) => e.message).join(' ') || 'refused',
          };
  }
  return { ok: false, status: res.status, error: `no action result in the answer: ${text.slice(0, 200)}` };
}

// First-load JavaScript per page of the production build, as a browser fetches it: every chunk of the
// page's entry and of each layout, template, error, loading and not-found boundary on its path, counted once,
// gzip-compressed (level 9, as `next build` reports). `next build` prints the page's own figure only.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { recordResults, verdict } from './stats';

const dist = path.resolve(process.env.NEXT_DIST_DIR ?? '.next-bench');
const manifest = JSON.parse(readFileSync(path.join(dist, 'app-build-manifest.json'), 'utf8')) as {
  pages: Record<string, string[]>;
};
const BOUNDARIES = ['layout', 'template', 'error', 'loading', 'not-found'];

// Targets from the issue: the desk and the sizing record, sign-in and sign-up, every other page.
const HEAVY = ['/(desk)/size/page', '/(desk)/sizings/[sizingId]/page'];
const LIGHT = ['/(auth)/sign-in/page', '/(auth)/sign-up/page'];
const targetKb = (entry: string) => (HEAVY.includes(entry) ? 200 : LIGHT.includes(entry) ? 130 : 160);

const gz = new Map<string, number>();
function gzipBytes(file: string): number {
  let n = gz.get(file);
  if (n === undefined) gz.set(file, (n = gzipSync(readFileSync(path.join(dist, file)), { level: 9 }).length));
  return n;
}

/** The files a page loads: its entry's and those of every boundary from the root down to it. */
export function firstLoadFiles(entry: string): string[] {
  const segments = entry.split('/').slice(1, -1);
  const files = new Set<string>(manifest.pages[entry] ?? []);
  for (let i = 0; i <= segments.length; i++) {
    const dir = segments.slice(0, i).join('/');
    for (const b of BOUNDARIES) for (const f of manifest.pages[`${dir ? `/${dir}` : ''}/${b}`] ?? []) files.add(f);
  }
  return [...files].filter((f) => f.endsWith('.js'));
}

/** The route as a user types it: groups dropped, `page` dropped. */
const routeOf = (entry: string) => entry.replace(/\/page$/, '').replace(/\/\([^)]+\)/g, '') || '/';

function main() {
  const pages = Object.keys(manifest.pages).filter((k) => k.endsWith('/page') && !k.startsWith('/_'));
  const shared = new Set(pages.map(firstLoadFiles).reduce((a, b) => a.filter((f) => b.includes(f))));
  const kb = (files: Iterable<string>) => [...files].reduce((s, f) => s + gzipBytes(f), 0) / 1024;
  const rows: [string, string, string, string][] = [
    ['shared by every page (framework, runtime, root layout)', `${kb(shared).toFixed(0)} kB`, 'info', '—'],
  ];
  const sized = pages.map((p) => ({ p, kb: kb(firstLoadFiles(p)) })).sort((a, b) => b.kb - a.kb);
  for (const { p, kb: size } of sized) {
    const t = targetKb(p);
    rows.push([routeOf(p), `${size.toFixed(0)} kB`, `< ${t} kB`, verdict(size < t)]);
  }
  recordResults('First-load JavaScript per page (gzip, page and layouts)', rows);
}

main();

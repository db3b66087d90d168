import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { expect, request, test, type APIRequestContext } from '@playwright/test';
import { accessTable, type Outcome, type Who } from './access-table';
import { e2eBaseUrl } from './ports';
import { scenarioIds, signInFor } from './support/scenario';

const root = path.join(__dirname, '..', '..');

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routeFiles(full);
    return name === 'page.tsx' || name === 'route.ts' ? [path.relative(root, full)] : [];
  });
}

async function contextFor(who: Who): Promise<APIRequestContext> {
  const ctx = await request.newContext({ baseURL: e2eBaseUrl });
  if (who !== 'anon') {
    const res = await ctx.post('/api/auth/sign-in', { data: signInFor[who] });
    expect(res.status(), `sign-in as ${who}`).toBe(200);
  }
  return ctx;
}

function classify(status: number, location: string | null): Outcome {
  if (status >= 300 && status < 400 && location) {
    if (location.includes('/sign-in')) return 'sign-in';
    if (location.includes('/no-access')) return 'no-access';
  }
  if (status === 404) return 'not-found';
  if (status === 200) return 'ok';
  return status;
}

test('every page and route handler has a row in the access table', () => {
  const files = new Set(routeFiles(path.join(root, 'app')));
  const covered = new Set(accessTable.map((r) => r.file));
  expect(
    [...files].filter((f) => !covered.has(f)),
    'routes without an access row',
  ).toEqual([]);
  expect(
    [...covered].filter((f) => !files.has(f)),
    'access rows for routes that do not exist',
  ).toEqual([]);
});

test('each role reaches exactly what the table allows, and nothing of another account', async () => {
  test.setTimeout(180_000);
  const ids = await scenarioIds();
  const failures: string[] = [];
  for (const who of ['anon', 'sales_engineer', 'customer', 'support', 'admin'] as const) {
    const ctx = await contextFor(who);
    for (const row of accessTable) {
      const url = row.path.replace(/:([a-zA-Z]+)/g, (_, k: string) => ids[k] ?? k);
      const res =
        row.method === 'POST'
          ? await ctx.post(url, { data: row.body ?? {}, maxRedirects: 0 })
          : await ctx.get(url, { maxRedirects: 0 });
      const expected = row.expect[who];
      const got =
        typeof expected === 'number' ? res.status() : classify(res.status(), res.headers()['location'] ?? null);
      if (got !== expected)
        failures.push(
          `${row.method ?? 'GET'} ${row.path} as ${who}: got ${got} (HTTP ${res.status()}), expected ${expected}`,
        );
    }
    await ctx.dispose();
  }
  expect(failures).toEqual([]);
});

import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { clusterFor } from '../integration/faults/private-cluster';
import { e2ePorts } from './ports';

// PostgreSQL stopped under a running production server (its own app on its own cluster, so the other
// journeys keep their database): the very first request to each page gets Dutywise's 503 page, an open
// desk keeps calculating, and after the restart pages answer again without restarting the app.
const root = path.join(__dirname, '..', '..');
const pg = clusterFor(`e2e-${e2ePorts.faultDb}`, e2ePorts.faultDb);
const base = `http://localhost:${e2ePorts.faultApp}`;
let app: ChildProcess | null = null;

const pages = ['/', '/pricing', '/sign-in', '/sign-up', '/size', '/sizings', '/quotes', '/accounts', '/datasheets'];

test.describe.configure({ mode: 'serial' });

test.beforeAll(async () => {
  test.setTimeout(240_000);
  pg.start();
  pg.migrate();
  // lib/server/serve.mjs, as the journeys' own app: a production start is refused without it. Demo mode accepts the private
  // cluster's owner role and the local fakes.
  app = spawn('node', ['lib/server/serve.mjs', '--port', String(e2ePorts.faultApp)], {
    cwd: root,
    stdio: 'ignore',
    env: {
      ...process.env,
      DATABASE_URL: pg.url,
      APP_URL: base,
      DEMO_MODE: 'on',
      NEXT_DIST_DIR: '.next-test',
      LOG_LEVEL: 'fatal',
    },
  });
  for (let i = 0; i < 120; i++) {
    const up = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`the app on ${base} did not answer its health check`);
});

test.afterAll(() => {
  app?.kill('SIGTERM');
  pg.stop();
});

test('database stopped: 503 page from the first request, the open desk keeps calculating, all recover', async ({
  browser,
  request,
}) => {
  test.setTimeout(120_000);
  const desk = await browser.newPage({ baseURL: base });
  await desk.goto('/size');
  await expect(desk.getByTestId('sizing-desk')).toHaveAttribute('data-hydrated', 'true');
  await desk.getByTestId('field-flow').fill('2');
  await expect(desk.getByTestId('result-panel')).toHaveAttribute('data-state', 'ready');
  const before = await desk.getByTestId('result-design-duty-kw').textContent();

  pg.stop();
  for (const p of pages) {
    const res = await request.get(`${base}${p}`, { maxRedirects: 0 });
    expect(res.status(), p).toBe(503);
    expect(await res.text(), p).toContain('Nothing you saved was lost');
  }
  const other = await browser.newPage({ baseURL: base });
  const shown = await other.goto('/quotes');
  expect(shown?.status()).toBe(503);
  await expect(other.getByRole('heading', { name: 'Dutywise is temporarily unavailable' })).toBeVisible();

  // The open desk needs no database to size: a changed flow gives a new result.
  await desk.getByTestId('field-flow').fill('4');
  await expect(desk.getByTestId('result-panel')).toHaveAttribute('data-state', 'ready');
  await expect(desk.getByTestId('result-design-duty-kw')).not.toHaveText(before ?? '');

  pg.start();
  const back = await other.goto('/quotes');
  expect(back?.status()).toBe(200);
  await expect(other).toHaveURL(/\/sign-in\?next=%2Fquotes/);
  expect((await request.get(`${base}/size`)).status()).toBe(200);
});

import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

const cfg = vi.hoisted(() => {
  // Well above the test clusters (55433 + TEST_PORT_OFFSET), so a parallel suite's cluster is never taken for ours.
  const port = 56000 + Math.floor(Math.random() * 450);
  process.env.DATABASE_URL = `postgres://postgres@127.0.0.1:${port}/dutywise_fault`;
  return { port };
});

import { actAs } from '../helpers/session';
import { GET as health } from '@/app/api/health/route';
import { GET as ready } from '@/app/api/ready/route';
import { GET as search } from '@/app/api/v1/support/search/route';
import { POST as calculate } from '@/app/api/v1/calculate/route';
import { clusterFor } from './private-cluster';
import middleware from '@/middleware';
import { NextRequest, type NextFetchEvent } from 'next/server';

const pg = clusterFor(`down-${cfg.port}`, cfg.port);
const body = JSON.stringify({
  service: 'heater',
  gas: { preset: 'nitrogen' },
  flow: { value: 1000, unit: 'kg/h' },
  inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 500, unit: 'kPa' } },
  outletTemperature: { value: 300, unit: 'degC' },
});

beforeAll(() => {
  pg.start();
  pg.migrate();
}, 120_000);
afterAll(() => pg.stop());

describe('PostgreSQL stopped mid-run', () => {
  it('health and readiness turn 503 with a clear reason, search answers 503, sizing still works, and all recover without a restart', async () => {
    expect((await health()).status).toBe(200);
    expect((await ready()).status).toBe(200);

    pg.stop();
    const down = await health();
    expect(down.status).toBe(503);
    const report = (await down.json()) as { database: { up: boolean; message: string } };
    expect(report.database.up).toBe(false);
    expect(report.database.message).toMatch(/Database unreachable/);
    expect(report.database.message).not.toMatch(/postgres:\/\//);
    expect((await ready()).status).toBe(503);

    // A signed-in look-up cannot load the user: an honest 503, not a hang or a stack trace.
    await actAs({ id: '00000000-0000-0000-0000-000000000009', role: 'support' });
    const looked = await search(new Request('http://localhost/api/v1/support/search?q=EH'), {
      params: Promise.resolve({}),
    });
    expect(looked.status).toBe(503);
    expect(looked.headers.get('retry-after')).toBeTruthy();

    // The calculation needs no database: the limiter steps aside and the sizing is answered.
    expect(
      (
        await calculate(
          new Request('http://localhost/api/v1/calculate', {
            method: 'POST',
            body,
            headers: { 'x-forwarded-for': '192.0.2.1' },
          }),
        )
      ).status,
    ).toBe(200);

    // Pages: the middleware answers the 503 page from the very first request (no cached "up" lets one through).
    const page = () => middleware(new NextRequest('http://localhost/quotes'), {} as NextFetchEvent);
    expect((await page())!.status).toBe(503);

    pg.start();
    let back = 0;
    for (let i = 0; i < 20 && back !== 200; i++) {
      back = (await health()).status;
      if (back !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(back).toBe(200);
    // and pages are served again at once (here: the sign-in redirect for a signed-out visitor)
    expect((await page())!.status).toBe(307);
  }, 120_000);
});

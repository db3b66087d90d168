import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

const cfg = vi.hoisted(() => {
  // Clear of the test clusters other checkouts run on 55433 + their TEST_PORT_OFFSET.
  const port = 56500 + Math.floor(Math.random() * 500);
  process.env.DATABASE_URL = `postgres://postgres@127.0.0.1:${port}/dutywise_fault`;
  return { port };
});

import { actAs } from '../helpers/session';
import { makeUser } from '../helpers/fixtures';
import { GET as health } from '@/app/api/health/route';
import { GET as ready } from '@/app/api/ready/route';
import { GET as search } from '@/app/api/v1/support/search/route';
import { POST as calculate } from '@/app/api/v1/calculate/route';
import { clusterFor } from './private-cluster';
import middleware from '@/middleware';
import { NextRequest, type NextFetchEvent } from 'next/server';
import { heaterJson } from '../helpers/heater-json';

const pg = clusterFor(`down-${cfg.port}`, cfg.port);
const body = heaterJson({
  gas: 'nitrogen',
  flowKgH: 1000,
  inletC: 20,
  pressure: { value: 500, unit: 'kPa' },
  outletC: 300,
});

beforeAll(() => {
  pg.start();
  pg.migrate();
}, 120_000);
afterAll(() => pg.stop());

describe('PostgreSQL stopped mid-run', () => {
  it('health and readiness turn 503 (the reason only in the log, details only for staff), search answers 503, sizing still works, and all recover without a restart', async () => {
    expect((await health()).status).toBe(200);
    expect((await ready()).status).toBe(200);
    // Signed-in staff see the details while the database answers.
    await actAs(await makeUser('support'));
    expect(await (await health()).json()).toMatchObject({ status: 'ok', database: { up: true } });

    pg.stop();
    // Down: the public answer (and staff's, whose sign-in cannot be loaded now) says only that.
    const down = await health();
    expect(down.status).toBe(503);
    expect(await down.json()).toEqual({ status: 'down' });
    const notReady = await ready();
    expect(notReady.status).toBe(503);
    expect(await notReady.json()).toEqual({ ready: false });

    // A signed-in look-up cannot load the user: an honest 503, not a hang or a stack trace.
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

    // Pages: the middleware answers a 503 page at once (its cached ping refreshes within seconds).
    const page = () => middleware(new NextRequest('http://localhost/quotes'), {} as NextFetchEvent);
    let pageStatus = 0;
    for (let i = 0; i < 40 && pageStatus !== 503; i++) {
      pageStatus = (await page())!.status;
      if (pageStatus !== 503) await new Promise((r) => setTimeout(r, 200));
    }
    expect(pageStatus).toBe(503);

    pg.start();
    let back = 0;
    for (let i = 0; i < 20 && back !== 200; i++) {
      back = (await health()).status;
      if (back !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(back).toBe(200);
    // and pages are served again (here: the sign-in redirect for a signed-out visitor)
    let after = 503;
    for (let i = 0; i < 40 && after === 503; i++) {
      after = (await page())!.status;
      if (after === 503) await new Promise((r) => setTimeout(r, 200));
    }
    expect(after).toBe(307);
  }, 120_000);
});

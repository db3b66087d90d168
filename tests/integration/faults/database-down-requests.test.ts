import { randomUUID } from 'node:crypto';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

// Every page, handler and server action while PostgreSQL is stopped: the very first request already gets
// Dutywise's 503 (page, JSON or action result), and the first request after the restart is served.
const cfg = vi.hoisted(() => {
  const port = 56450 + Math.floor(Math.random() * 450);
  process.env.DATABASE_URL = `postgres://postgres@127.0.0.1:${port}/dutywise_fault`;
  process.env.STRIPE_WEBHOOK_SECRET = 'whsec_database_down';
  return { port, webhookSecret: 'whsec_database_down' };
});

import { actAs, actWithSignedCookie } from '../helpers/session';
import { clusterFor } from './private-cluster';
import { accessTable } from '../../e2e/access-table';
import middleware from '@/middleware';
import { NextRequest, type NextFetchEvent } from 'next/server';
import { POST as signIn } from '@/app/api/auth/sign-in/route';
import { GET as billingStatus } from '@/app/api/v1/billing/status/route';
import { POST as batchPreview } from '@/app/api/v1/batch/preview/route';
import { POST as batchCommit } from '@/app/api/v1/batch/commit/route';
import { GET as datasheet } from '@/app/api/v1/datasheets/[revisionId]/route';
import { GET as supportExport } from '@/app/api/v1/support/export/route';
import { POST as webhook } from '@/app/api/webhooks/stripe/route';
import { POST as calculate } from '@/app/api/v1/calculate/route';
import { env } from '@/lib/env';
import { LOCAL_SESSION_COOKIE, signLocalSession } from '@/lib/auth/local/session-token';
import { saveSizingAction } from '@/app/(desk)/size/actions';
import { issueDatasheetAction } from '@/app/(desk)/datasheets/actions';
import { setQuoteStatusAction } from '@/app/(desk)/quotes/[quoteId]/actions';
import { signUpAction } from '@/app/(auth)/sign-up/actions';
import { UNAVAILABLE_MESSAGE } from '@/lib/ops/unavailable';
import { heaterJson } from '../helpers/heater-json';

const pg = clusterFor(`requests-${cfg.port}`, cfg.port);
const someId = '7d0c5a52-6a8e-4e38-9d59-3f1e0f6c2b11';
// Every page of the access matrix, placeholders filled with an id (the 503 comes before any look-up).
const pagePaths = [
  ...new Set(accessTable.filter((r) => r.file.endsWith('page.tsx')).map((r) => r.path.replace(/:\w+/g, someId))),
];
const visit = (path: string, headers: Record<string, string> = {}) =>
  middleware(new NextRequest(`http://localhost${path}`, { headers }), {} as NextFetchEvent) as Promise<Response>;
const ctx = () => ({ params: Promise.resolve({}) });
const post = (path: string, body: string, headers: Record<string, string> = {}) =>
  new Request(`http://localhost${path}`, { method: 'POST', body, headers });

async function expectUnavailableJson(res: Response) {
  expect(res.status).toBe(503);
  expect(res.headers.get('retry-after')).toMatch(/^\d+$/);
  expect(((await res.json()) as { errors: { message: string }[] }).errors[0]?.message).toBe(UNAVAILABLE_MESSAGE);
}

beforeAll(() => {
  pg.start();
  pg.migrate();
}, 120_000);
afterAll(() => pg.stop());

describe('requests while PostgreSQL is stopped', () => {
  it('while it is up, pages pass the middleware', async () => {
    expect(pagePaths.length).toBeGreaterThan(15);
    expect((await visit('/sizings')).status).toBe(307);
    expect((await visit('/sign-in')).headers.get('x-request-id')).toBeTruthy();
  });

  it('the very first request to every page answers the 503 page, for documents and client navigations', async () => {
    pg.stop();
    for (const path of pagePaths) {
      const res = await visit(path);
      expect(res.status, path).toBe(503);
      expect(res.headers.get('content-type'), path).toMatch(/^text\/html/);
      expect(res.headers.get('retry-after'), path).toMatch(/^\d+$/);
      const html = await res.text();
      expect(html, path).toContain('Dutywise is temporarily unavailable');
      expect(html, path).toContain('Nothing you saved was lost');
    }
    // A client-side navigation (an RSC request) gets the same answer, and the browser then shows the page.
    expect((await visit('/quotes', { rsc: '1' })).status).toBe(503);
    // Handlers behind the middleware answer JSON.
    await expectUnavailableJson(await visit('/api/v1/support/search?q=EH'));
  });

  it('every handler that needs the database answers 503 JSON on its own', async () => {
    await expectUnavailableJson(
      await signIn(post('/api/auth/sign-in', JSON.stringify({ email: 'a@b.example', password: 'x' }))),
    );
    await actWithSignedCookie(someId);
    await expectUnavailableJson(await billingStatus(new Request('http://localhost/api/v1/billing/status'), ctx()));
    await actWithSignedCookie(someId);
    await expectUnavailableJson(await batchPreview(post('/api/v1/batch/preview', 'x'), ctx()));
    await expectUnavailableJson(await batchCommit(post('/api/v1/batch/commit', 'x'), ctx()));
    await expectUnavailableJson(
      await datasheet(new Request(`http://localhost/api/v1/datasheets/${someId}`), {
        params: Promise.resolve({ revisionId: someId }),
      }),
    );
    await actWithSignedCookie(someId);
    await expectUnavailableJson(await supportExport(new Request('http://localhost/api/v1/support/export?q=EH'), ctx()));
    // A payment event is refused with 503, so the sender delivers it again later.
    const payload = JSON.stringify({
      id: 'evt_db_down',
      object: 'event',
      type: 'invoice.paid',
      data: { object: { id: 'in_db_down', object: 'invoice' } },
    });
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: cfg.webhookSecret });
    await expectUnavailableJson(
      await webhook(post('/api/webhooks/stripe', payload, { 'stripe-signature': signature })),
    );
  });

  it('the desk keeps calculating for a signed-in person; a request with an API key that cannot be checked gets 503', async () => {
    const sizing = heaterJson({
      gas: 'air',
      flowKgH: 900,
      inletC: 15,
      pressure: { value: 2, unit: 'barg' },
      outletC: 200,
    });
    const session = await signLocalSession(someId, randomUUID(), env.SESSION_SECRET, 600);
    const desk = await calculate(post('/api/v1/calculate', sizing, { cookie: `${LOCAL_SESSION_COOKIE}=${session}` }));
    expect(desk.status).toBe(200);
    expect(desk.headers.get('ratelimit-policy')).toContain('per signed-in user');
    const keyed = await calculate(
      post('/api/v1/calculate', sizing, { authorization: `Bearer dwk_abcdefgh_${'A'.repeat(43)}` }),
    );
    await expectUnavailableJson(keyed);
  });

  it('server actions answer 503 with the same message, signed in or not', async () => {
    await actWithSignedCookie(someId);
    const results: unknown[] = [
      await saveSizingAction({ accountId: someId, title: 'Regeneration gas heater', input: {} }),
      await issueDatasheetAction({ sizingId: someId }),
      await setQuoteStatusAction({ quoteId: someId, status: 'sent' }),
    ];
    await actAs(null);
    results.push(
      await signUpAction({
        name: 'Ada Fenwick',
        email: 'ada@fenwick.example',
        password: 'a-long-enough-password',
        company: 'Fenwick Drying',
      }),
    );
    for (const r of results)
      expect(r).toMatchObject({ ok: false, status: 503, errors: [{ path: '', message: UNAVAILABLE_MESSAGE }] });
  });

  it('the very first request after the restart is served, without restarting anything', async () => {
    pg.start();
    expect((await visit('/sizings')).status).toBe(307);
    const signInPage = await visit('/sign-in');
    expect(signInPage.status).toBe(200);
    expect(signInPage.headers.get('x-request-id')).toBeTruthy();
  });
});

import fc from 'fast-check';
import { describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  // The fuzz sends far more than a client may; the limiter itself is tested elsewhere.
  process.env.RATE_LIMIT_CALCULATE_PER_MIN = '100000000';
});

import { POST } from '@/app/api/v1/calculate/route';
import { allFinite, anyBody, nearValidRequest } from './arbitraries';

const post = (body: string) =>
  POST(
    new Request('http://localhost/api/v1/calculate', {
      method: 'POST',
      body,
      headers: { 'content-type': 'application/json', 'x-forwarded-for': '203.0.113.9' },
    }),
  );

describe('calculate API under hostile input', () => {
  it('answers 10,000 generated bodies with 200 or a 4xx naming the problem, never a 500 or a non-finite figure', async () => {
    let ok = 0;
    await fc.assert(
      fc.asyncProperty(anyBody, async (body) => {
        const res = await post(body);
        const json = (await res.json()) as { errors?: { path: string; message: string }[] };
        expect([200, 400, 413, 429]).toContain(res.status);
        if (res.status === 200) {
          ok++;
          expect(allFinite(json)).toBe(true);
        } else {
          expect(json.errors?.length).toBeGreaterThan(0);
          for (const e of json.errors ?? []) expect(typeof e.message).toBe('string');
        }
      }),
      { numRuns: 10_000 },
    );
    // Some generated requests must be valid, or the fuzz never reached the engine.
    expect(ok).toBeGreaterThan(0);
  }, 300_000);

  it('refuses bodies over 64 KiB with 413', async () => {
    const res = await post(JSON.stringify({ service: 'heater', notes: 'x'.repeat(70_000) }));
    expect(res.status).toBe(413);
  });

  it('names the field of each bad part of a near-valid request', async () => {
    await fc.assert(
      fc.asyncProperty(nearValidRequest, async (req) => {
        const res = await post(JSON.stringify(req));
        if (res.status === 400) {
          const { errors } = (await res.json()) as { errors: { path: string; message: string }[] };
          for (const e of errors) expect(e.message.length).toBeGreaterThan(3);
        }
      }),
      { numRuns: 500 },
    );
  });
});

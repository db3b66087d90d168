import { describe, expect, it, vi } from 'vitest';

// The calculate API counts signed-in people each on their own budget, so an office behind one address is not
// throttled as one client; anonymous callers keep the per-address budget. Small limits keep the test quick.
vi.hoisted(() => {
  process.env.RATE_LIMIT_CALCULATE_PER_MIN = '5';
  process.env.RATE_LIMIT_CALCULATE_PER_USER_PER_MIN = '80';
});

import { randomUUID } from 'node:crypto';
import { POST } from '@/app/api/v1/calculate/route';
import { env } from '@/lib/env';
import { LOCAL_SESSION_COOKIE, signLocalSession } from '@/lib/auth/local/session-token';
import { heaterJson } from '../helpers/heater-json';

// Air, 100 kg/h, 20 to 80 °C at one atmosphere: the helper's defaults.
const body = heaterJson();
const office = () => `203.0.113.${Math.floor(Math.random() * 250)}-${randomUUID().slice(0, 6)}`;
const calc = (address: string, cookie?: string) =>
  POST(
    new Request('http://localhost/api/v1/calculate', {
      method: 'POST',
      body,
      headers: { 'x-forwarded-for': address, ...(cookie ? { cookie: `${LOCAL_SESSION_COOKIE}=${cookie}` } : {}) },
    }),
  );
const session = async () => signLocalSession(randomUUID(), 'sales_engineer', env.SESSION_SECRET, 600);

describe('calculate limits per caller', () => {
  it('four signed-in people behind one address, a minute of calculating each, get no 429', async () => {
    const address = office();
    const cookies = await Promise.all([session(), session(), session(), session()]);
    const statuses = new Map<number, number>();
    // 60 calculations each (once a second for a minute, sent back to back): 240 from one address.
    for (let second = 0; second < 60; second++)
      for (const c of cookies) {
        const res = await calc(address, c);
        statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      }
    expect(Object.fromEntries(statuses)).toEqual({ 200: 240 });

    const seen = await calc(address, cookies[0]);
    expect(seen.headers.get('ratelimit-limit')).toBe('80');
    expect(seen.headers.get('ratelimit-remaining')).toBe('19');
    expect(seen.headers.get('ratelimit-policy')).toBe('80;w=60;comment="per signed-in user"');
    expect(Number(seen.headers.get('ratelimit-reset'))).toBeGreaterThan(0);
  });

  it('an anonymous client from the same office address is still refused past the per-address limit', async () => {
    const address = office();
    const colleague = await session();
    for (let i = 0; i < 10; i++) expect((await calc(address, colleague)).status).toBe(200);
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) statuses.push((await calc(address)).status);
    expect(statuses).toEqual([200, 200, 200, 200, 200, 429]);
    const refused = await calc(address);
    expect(refused.headers.get('ratelimit-policy')).toBe('5;w=60;comment="per client address"');
    expect(refused.headers.get('ratelimit-remaining')).toBe('0');
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    // The signed-in colleague is unaffected by the anonymous client's refusal.
    expect((await calc(address, colleague)).status).toBe(200);
  });

  it('a person has a limit of their own, and a forged session counts as anonymous', async () => {
    const busy = await session();
    const address = office();
    for (let i = 0; i < 80; i++) expect((await calc(office(), busy)).status).toBe(200);
    expect((await calc(address, busy)).status).toBe(429);

    const forged = `${(await session()).slice(0, -4)}AAAA`;
    const res = await calc(address, forged);
    expect(res.headers.get('ratelimit-policy')).toContain('per client address');
  });
});

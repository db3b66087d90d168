import { describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.RATE_LIMIT_CALCULATE_PER_MIN = '5';
  process.env.RATE_LIMIT_SIGN_IN_PER_MIN = '3';
});

import { POST as calculatePost } from '@/app/api/v1/calculate/route';
import { POST as signInPost } from '@/app/api/auth/sign-in/route';

const body = JSON.stringify({
  service: 'heater',
  gas: { preset: 'air' },
  flow: { value: 100, unit: 'kg/h' },
  inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 101.325, unit: 'kPa' } },
  outletTemperature: { value: 80, unit: 'degC' },
});
const addr = () => `198.51.100.${Math.floor(Math.random() * 250)}-${Math.random().toString(36).slice(2, 8)}`;
const calc = (ip: string, post = calculatePost) =>
  post(new Request('http://localhost/api/v1/calculate', { method: 'POST', body, headers: { 'x-forwarded-for': ip } }));

describe('rate limits', () => {
  it('the public calculate API answers 429 with Retry-After past the per-address limit', async () => {
    const ip = addr();
    const statuses = [];
    for (let i = 0; i < 7; i++) statuses.push((await calc(ip)).status);
    expect(statuses.slice(0, 5)).toEqual([200, 200, 200, 200, 200]);
    const refused = await calc(ip);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    // another address is not affected
    expect((await calc(addr())).status).toBe(200);
  });

  it('the limit is shared: a second app instance sees the first one’s count', async () => {
    const ip = addr();
    for (let i = 0; i < 3; i++) expect((await calc(ip)).status).toBe(200);
    vi.resetModules();
    const second = (await import('@/app/api/v1/calculate/route')).POST;
    expect((await calc(ip, second)).status).toBe(200);
    expect((await calc(ip, second)).status).toBe(200);
    expect((await calc(ip, second)).status).toBe(429);
  });

  it('sign-in answers 429 with Retry-After after repeated attempts from one address', async () => {
    const ip = addr();
    const attempt = () =>
      signInPost(
        new Request('http://localhost/api/auth/sign-in', {
          method: 'POST',
          body: JSON.stringify({ email: 'nobody@nowhere.example', password: 'guess' }),
          headers: { 'x-forwarded-for': ip },
        }),
      );
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await attempt()).status);
    expect(statuses).toEqual([401, 401, 401, 429]);
    expect((await attempt()).headers.get('retry-after')).toMatch(/^\d+$/);
  });
});

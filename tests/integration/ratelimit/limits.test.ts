import { describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.RATE_LIMIT_CALCULATE_PER_MIN = '5';
  (globalThis as { __dutywisePeerHeader?: boolean }).__dutywisePeerHeader = true;
});

import { sql } from 'drizzle-orm';
import { POST as calculatePost } from '@/app/api/v1/calculate/route';
import { db } from '@/db';
import { rateLimitCounters } from '@/db/schema';
import { purgeExpiredCounters } from '@/lib/ratelimit/store';
import { heaterJson } from '../helpers/heater-json';

// Air, 100 kg/h, 20 to 80 °C at one atmosphere: the helper's defaults.
const body = heaterJson();
// A new address on every call: a random pick could land on one an earlier test used up (refused with 429).
let addrs = Math.floor(Math.random() * 250);
const addr = () => `198.51.100.${(addrs++ % 250) + 1}`;
const calc = (ip: string, post = calculatePost, spoofed = `203.0.113.${Math.floor(Math.random() * 250)}`) =>
  post(
    new Request('http://localhost/api/v1/calculate', {
      method: 'POST',
      body,
      headers: { 'x-dutywise-peer': ip, 'x-forwarded-for': spoofed },
    }),
  );

describe('rate limits', () => {
  it('the public calculate API answers 429 with Retry-After past the per-address limit, whatever header is sent', async () => {
    const ip = addr();
    const statuses = [];
    for (let i = 0; i < 5; i++) statuses.push((await calc(ip)).status);
    expect(statuses).toEqual([200, 200, 200, 200, 200]);
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

  it('counters live in rate_limit_counters with an expiry, and expired ones are purged', async () => {
    const ip = addr();
    await calc(ip);
    const rows = await db
      .select()
      .from(rateLimitCounters)
      .where(sql`${rateLimitCounters.key} = ${`calculate.address:${ip}`}`);
    expect(rows).toHaveLength(1);
    expect(rows[0]!.expire).toBeGreaterThan(Date.now());
    expect(rows[0]!.expire).toBeLessThanOrEqual(Date.now() + 60_000);
    const stale = `calculate.address:stale-${ip}`;
    await db.insert(rateLimitCounters).values({ key: stale, points: 3, expire: Date.now() - 2 * 3_600_000 });
    expect(await purgeExpiredCounters()).toBeGreaterThanOrEqual(1);
    expect(
      await db
        .select()
        .from(rateLimitCounters)
        .where(sql`${rateLimitCounters.key} = ${stale}`),
    ).toEqual([]);
    expect(
      await db
        .select()
        .from(rateLimitCounters)
        .where(sql`${rateLimitCounters.key} = ${`calculate.address:${ip}`}`),
    ).toHaveLength(1);
  });
});

import { randomUUID } from 'node:crypto';
import { describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.RATE_LIMIT_CALCULATE_PER_MIN = '10';
  (globalThis as { __dutywisePeerHeader?: boolean }).__dutywisePeerHeader = true;
});

import { eq, getTableName } from 'drizzle-orm';
import { POST as calculatePost } from '@/app/api/v1/calculate/route';
import { db, pool } from '@/db';
import { rateLimitCounters } from '@/db/schema';
import { groupedSpender } from '@/lib/ratelimit/grouped-spend';
import { heaterJson } from '../helpers/heater-json';

const table = getTableName(rateLimitCounters);
const key = () => `test.grouped:${randomUUID()}`;
// Air, 100 kg/h, 20 to 80 °C at one atmosphere: the helper's defaults.
const body = heaterJson();

describe('rate-limit points spent in grouped round trips', () => {
  it('counts every spend once and hands each its own running total, whatever the grouping', async () => {
    const spend = groupedSpender(pool, table);
    const [a, b] = [key(), key()];
    const spends = await Promise.all(
      Array.from({ length: 40 }, (_, i) => spend(i % 4 === 0 ? b : a, i % 4 === 0 ? 1 : 1 + (i % 2), 60_000)),
    );
    // Key a got 30 spends: 20 of 2 points and 10 of 1 (50 in all); key b 10 spends of 1 point.
    const totalsA = spends.filter((_, i) => i % 4 !== 0).map((s) => s.consumed);
    const totalsB = spends.filter((_, i) => i % 4 === 0).map((s) => s.consumed);
    expect(new Set(totalsA).size).toBe(30);
    expect(Math.max(...totalsA)).toBe(50);
    expect([...totalsB].sort((x, y) => x - y)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    const [row] = await db.select().from(rateLimitCounters).where(eq(rateLimitCounters.key, a));
    expect(row!.points).toBe(50);
    expect(row!.expire).toBeGreaterThan(Date.now());
  });

  it('starts a new window once the old one has expired', async () => {
    const spend = groupedSpender(pool, table);
    const k = key();
    await db.insert(rateLimitCounters).values({ key: k, points: 99, expire: Date.now() - 1_000 });
    const spent = await spend(k, 1, 60_000);
    expect(spent.consumed).toBe(1);
    expect(spent.expire).toBeGreaterThan(Date.now() + 55_000);
  });

  it('a burst of 30 calculations from one address at once: exactly the 10 of the limit answered, the rest 429', async () => {
    const peer = `198.51.100.${Math.floor(Math.random() * 250) + 1}`;
    const statuses = await Promise.all(
      Array.from({ length: 30 }, () =>
        calculatePost(
          new Request('http://localhost/api/v1/calculate', {
            method: 'POST',
            body,
            headers: { 'x-dutywise-peer': peer },
          }),
        ).then((r) => r.status),
      ),
    );
    expect(statuses.filter((s) => s === 200)).toHaveLength(10);
    expect(statuses.filter((s) => s === 429)).toHaveLength(20);
  });
});

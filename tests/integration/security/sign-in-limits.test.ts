import { randomUUID } from 'node:crypto';
import { describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.RATE_LIMIT_SIGN_IN_PER_MIN = '4';
  process.env.RATE_LIMIT_SIGN_IN_FAILURES = '3';
  // As under lib/server/serve.mjs: x-dutywise-peer is the socket's address, which a client cannot choose.
  (globalThis as { __dutywisePeerHeader?: boolean }).__dutywisePeerHeader = true;
});

import '../helpers/session';
import { POST as signIn } from '@/app/api/auth/sign-in/route';
import { hashPassword } from '@/lib/auth/local/passwords';
import { makeUser } from '../helpers/fixtures';

// Every call gets an address no other call in this file has: a random pick could land on the address the first
// test used up, and that attempt would be refused as rate limited. 198.18.0.0/15 is reserved for benchmarking
// (RFC 2544), whose upper half (198.19) no other test file uses.
let peers = Math.floor(Math.random() * 60_000);
const peer = () => {
  peers += 1;
  return `198.19.${(peers >> 8) & 255}.${peers & 255}`;
};
const spoof = () =>
  `${Math.floor(Math.random() * 223) + 1}.${Math.floor(Math.random() * 255)}.0.${Math.floor(Math.random() * 255)}`;

function attempt(body: Record<string, unknown>, headers: Record<string, string>) {
  return signIn(
    new Request('http://localhost:3000/api/auth/sign-in', {
      method: 'POST',
      body: JSON.stringify(body),
      headers: { 'content-type': 'application/json', origin: 'http://localhost:3000', ...headers },
    }),
  );
}

describe('sign-in limits that a client cannot dodge', () => {
  it('a changing X-Forwarded-For does not reset the per-address count: the socket address is counted', async () => {
    const socket = peer();
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) {
      const email = `nobody-${randomUUID().slice(0, 8)}@nowhere.example`;
      const res = await attempt(
        { email, password: 'guess-guess' },
        { 'x-dutywise-peer': socket, 'x-forwarded-for': spoof() },
      );
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 401, 401, 429, 429]);
    // Another socket address has its own budget.
    const other = await attempt({ email: 'a@b.example', password: 'guess-guess' }, { 'x-dutywise-peer': peer() });
    expect(other.status).toBe(401);
  });

  it('failed sign-ins lock the account with a back-off, from whatever address they come, before any hashing', async () => {
    const user = await makeUser('customer', undefined, { passwordHash: await hashPassword('the-right-password') });
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++)
      statuses.push(
        (await attempt({ email: user.email, password: `wrong-${i}-guess` }, { 'x-dutywise-peer': peer() })).status,
      );
    // Three failures are counted; the third locks the account, so the fourth is refused without a check.
    expect(statuses).toEqual([401, 401, 401, 429]);
    const locked = await attempt({ email: user.email, password: 'the-right-password' }, { 'x-dutywise-peer': peer() });
    expect(locked.status).toBe(429);
    expect(Number(locked.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(Number(locked.headers.get('retry-after'))).toBeLessThanOrEqual(15);
  });

  it('refuses a sign-in posted from another site', async () => {
    const user = await makeUser('support', undefined, { passwordHash: await hashPassword('the-right-password') });
    const body = { email: user.email, password: 'the-right-password' };
    const cross = await attempt(body, { 'x-dutywise-peer': peer(), origin: 'https://evil.example' });
    expect(cross.status).toBe(403);
    const fetchSite = await attempt(body, { 'x-dutywise-peer': peer(), 'sec-fetch-site': 'cross-site' });
    expect(fetchSite.status).toBe(403);
    expect((await attempt(body, { 'x-dutywise-peer': peer() })).status).toBe(200);
  });

  it('answers where to go next, on this site only', async () => {
    const user = await makeUser('support', undefined, { passwordHash: await hashPassword('the-right-password') });
    // Anything that is not a plain path on this site lands on /home, which sends each role to its own page.
    for (const [next, expected] of [
      ['/%5Cevil.example', '/home'],
      ['/%09/evil.example', '/home'],
      ['https://evil.example/', '/home'],
      ['/quotes?status=sent', '/quotes?status=sent'],
    ]) {
      const res = await attempt(
        { email: user.email, password: 'the-right-password', next },
        { 'x-dutywise-peer': peer() },
      );
      expect(res.status).toBe(200);
      expect(await res.json()).toEqual({ signedIn: true, redirectTo: expected });
    }
  });

  it('an unverified address cannot sign in, even with the right password', async () => {
    const user = await makeUser('customer', undefined, {
      passwordHash: await hashPassword('the-right-password'),
      unverified: true,
    });
    const res = await attempt({ email: user.email, password: 'the-right-password' }, { 'x-dutywise-peer': peer() });
    expect(res.status).toBe(403);
    expect((await res.json()).errors[0].message).toMatch(/Confirm your e-mail address/);
  });
});

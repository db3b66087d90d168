import { NextRequest, type NextFetchEvent } from 'next/server';
import { setupServer } from 'msw/node';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';
import { clerkBackendHandlers } from '@/mocks/clerk/backend-handlers';
import { makeClerkKeys, publishableKey, signClerkSession } from '../helpers/clerk-keys';

// The production identity path, exercised offline: Clerk's own middleware verifies RS256 session
// tokens against CLERK_JWT_KEY (a key pair made here), and the backend API is answered by msw.
const clerkUserId = `user_${Math.random().toString(36).slice(2, 10)}`;
const server = setupServer(
  ...clerkBackendHandlers([
    {
      id: clerkUserId,
      email: `${clerkUserId}@customer.example`,
      firstName: 'Rhea',
      lastName: 'Voss',
      role: 'sales_engineer',
    },
  ]),
);
let keys: Awaited<ReturnType<typeof makeClerkKeys>>;
let middleware: (req: NextRequest, ev: NextFetchEvent) => Promise<Response> | Response;

function requestWith(token: string, path = '/quotes') {
  const iat = JSON.parse(Buffer.from(token.split('.')[1] ?? '', 'base64url').toString()).iat as number;
  return new NextRequest(`https://desk.dutywise.test${path}`, {
    headers: {
      cookie: `__session=${token}; __client_uat=${iat - 1}`,
      accept: 'text/html',
      'sec-fetch-dest': 'document',
    },
  });
}
// Refused means redirected (to sign-in or Clerk's handshake) and never marked signed in.
function expectRefused(res: Response) {
  expect(res.headers.get('x-middleware-request-x-clerk-auth-status')).not.toBe('signed-in');
  expect(res.status).toBeGreaterThanOrEqual(300);
  expect(res.status).toBeLessThan(400);
  expect(res.headers.get('location')).toBeTruthy();
}
const event = { waitUntil: () => undefined } as unknown as NextFetchEvent;

beforeAll(async () => {
  keys = await makeClerkKeys();
  vi.stubEnv('NEXT_PUBLIC_CLERK_PUBLISHABLE_KEY', publishableKey);
  vi.stubEnv('CLERK_SECRET_KEY', 'sk_live_dutywise_test');
  vi.stubEnv('CLERK_JWT_KEY', keys.publicPem);
  vi.stubEnv('CLERK_API_URL', 'http://clerk-api.dutywise.test');
  server.listen({ onUnhandledRequest: 'error' });
  vi.resetModules();
  middleware = (await import('@/middleware')).default as typeof middleware;
});
afterAll(() => {
  server.close();
  vi.unstubAllEnvs();
});

describe('Clerk session tokens in middleware', () => {
  it('accepts a valid locally signed token and lets the protected page through', async () => {
    const res = await middleware(requestWith(await signClerkSession(keys.privateKey, { sub: clerkUserId })), event);
    expect(res.headers.get('location')).toBeNull();
    expect(res.headers.get('x-middleware-request-x-clerk-auth-status')).toBe('signed-in');
    expect(res.headers.get('x-request-id')).toBeTruthy();
  });

  it('refuses an expired token (redirect to sign-in, never through)', async () => {
    const token = await signClerkSession(keys.privateKey, { sub: clerkUserId, expiresInS: -120, iatOffsetS: -600 });
    const res = await middleware(requestWith(token), event);
    expectRefused(res);
  });

  it('refuses a tampered token', async () => {
    const token = await signClerkSession(keys.privateKey, { sub: clerkUserId });
    const [h, p, s] = token.split('.');
    const forged = JSON.parse(Buffer.from(p ?? '', 'base64url').toString());
    forged.sub = 'user_someone_else';
    const res = await middleware(
      requestWith(`${h}.${Buffer.from(JSON.stringify(forged)).toString('base64url')}.${s}`),
      event,
    );
    expectRefused(res);
  });

  it('lets public pages through without a session', async () => {
    const res = await middleware(new NextRequest('https://desk.dutywise.test/size'), event);
    expect(res.headers.get('location')).toBeNull();
  });
});

describe('mapping a Clerk user to a Dutywise user', () => {
  it('creates the row on first sign-in with the role from public metadata, then reuses it', async () => {
    const { mapClerkUser } = await import('@/lib/auth/clerk-user');
    const first = await mapClerkUser(clerkUserId);
    expect(first).toMatchObject({
      email: `${clerkUserId}@customer.example`,
      name: 'Rhea Voss',
      role: 'sales_engineer',
      accountId: null,
    });
    const again = await mapClerkUser(clerkUserId);
    expect(again?.id).toBe(first?.id);
    const { db } = await import('@/db');
    const { users, auditLog } = await import('@/db/schema');
    const rows = await db.select({ id: users.id }).from(users).where(eq(users.clerkUserId, clerkUserId));
    expect(rows).toHaveLength(1);
    const audits = await db.select({ action: auditLog.action }).from(auditLog).where(eq(auditLog.entityId, first!.id));
    expect(audits.map((a) => a.action)).toContain('user.created');
  });

  it('an unknown Clerk user maps to nobody', async () => {
    const { mapClerkUser } = await import('@/lib/auth/clerk-user');
    await expect(mapClerkUser('user_not_there')).rejects.toBeTruthy();
  });
});

describe('role from metadata', () => {
  it('falls back to customer for anything unknown (least privilege)', async () => {
    const { roleFromMetadata } = await import('@/lib/auth/clerk-user');
    expect(roleFromMetadata({ role: 'admin' })).toBe('admin');
    expect(roleFromMetadata({ role: 'superuser' })).toBe('customer');
    expect(roleFromMetadata(null)).toBe('customer');
  });
});

import { randomInt, randomUUID } from 'node:crypto';
import { vi } from 'vitest';
import { openSession } from '@/lib/auth/local/session-store';
import { LOCAL_SESSION_COOKIE, signLocalSession } from '@/lib/auth/local/session-token';
import { env } from '@/lib/env';

// Server actions read the session from next/headers; outside a request the test supplies the cookie jar and the
// request headers. Each test file acts from its own client address (so rate-limit budgets are not shared between
// files), and a test can move to another with actFrom().
const jar = new Map<string, string>();
let clientAddress = `198.18.${randomInt(0, 256)}.${randomInt(1, 255)}`;

vi.mock('next/headers', () => ({
  cookies: async () => ({
    get: (name: string) => (jar.has(name) ? { name, value: jar.get(name) } : undefined),
    set: (name: string, value: string) => void jar.set(name, value),
    delete: (name: string) => void jar.delete(name),
  }),
  headers: async () =>
    new Headers({ host: 'localhost:3000', origin: 'http://localhost:3000', 'x-forwarded-for': clientAddress }),
}));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

/** Acts as this user (or signed out with null) for the server actions called next: a real server-side session. */
export async function actAs(user: { id: string } | null): Promise<void> {
  jar.clear();
  if (user) jar.set(LOCAL_SESSION_COOKIE, (await openSession(user.id)).token);
}

/**
 * Presents a validly signed session cookie for `userId` without touching the database (whose session row does not
 * exist): for tests that run with the database stopped, where every request must answer 503 before any check.
 */
export async function actWithSignedCookie(userId: string): Promise<void> {
  jar.clear();
  jar.set(LOCAL_SESSION_COOKIE, await signLocalSession(userId, randomUUID(), env.SESSION_SECRET, 600));
}

/** Sends the next actions from this client address. */
export function actFrom(address: string): void {
  clientAddress = address;
}

export function currentCookie(name: string): string | undefined {
  return jar.get(name);
}

/** Presents a cookie kept from earlier again (another device, or a copied cookie). */
export function restoreCookie(name: string, value: string): void {
  jar.set(name, value);
}

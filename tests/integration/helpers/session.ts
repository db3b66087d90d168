import { vi } from 'vitest';
import { env } from '@/lib/env';
import { LOCAL_SESSION_COOKIE, signLocalSession } from '@/lib/auth/local/session-token';

// Server actions read the session from next/headers; outside a request the test supplies the cookie jar.
const jar = new Map<string, string>();

vi.mock('next/headers', () => ({
  cookies: async () => ({
    get: (name: string) => (jar.has(name) ? { name, value: jar.get(name) } : undefined),
    set: (name: string, value: string) => void jar.set(name, value),
    delete: (name: string) => void jar.delete(name),
  }),
  headers: async () => new Headers({ host: 'localhost:3000', origin: 'http://localhost:3000' }),
}));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

/** Acts as this user (or signed out with null) for the server actions called next. */
export async function actAs(user: { id: string; role: string } | null): Promise<void> {
  jar.clear();
  if (user) jar.set(LOCAL_SESSION_COOKIE, await signLocalSession(user.id, user.role, env.SESSION_SECRET, 600));
}

export function currentCookie(name: string): string | undefined {
  return jar.get(name);
}

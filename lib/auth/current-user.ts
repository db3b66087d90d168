import 'server-only';
import { cookies } from 'next/headers';
import { cache } from 'react';
import { clerkEnabled, env } from '@/lib/env';
import { loadUser, type CurrentUser } from './load-user';
import { LOCAL_SESSION_COOKIE, verifyLocalSession } from './local/session-token';

export type { CurrentUser } from './load-user';

async function localUser(): Promise<CurrentUser | null> {
  const store = await cookies();
  const claims = await verifyLocalSession(store.get(LOCAL_SESSION_COOKIE)?.value, env.SESSION_SECRET);
  if (!claims) return null;
  return loadUser({ id: claims.sub, sessionId: claims.sid });
}

async function clerkUser(): Promise<CurrentUser | null> {
  const { resolveClerkUser } = await import('./clerk-user');
  return resolveClerkUser();
}

/** The current user for this request (memoised per request), or null when signed out. */
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  return clerkEnabled ? clerkUser() : localUser();
});

'use server';

import { redirect } from 'next/navigation';
import { endLocalSession } from '@/lib/auth/local/session';

/** Ends the local session. Signing in is a route handler (POST /api/auth/sign-in) so it can answer 429. */
export async function signOutAction(): Promise<void> {
  await endLocalSession();
  redirect('/');
}

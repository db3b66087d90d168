'use server';

import { checkLocalCredentials, endLocalSession, startLocalSession } from '@/lib/auth/local-session';
import { signInSchema } from '@/lib/auth/schema';
import { fieldErrorsOf, type ActionResult } from '@/lib/actions/define-action';
import { clerkEnabled } from '@/lib/env';
import { redirect } from 'next/navigation';

/** Local identity sign-in. Not wrapped in defineAction: it is the one action a signed-out person may call. */
export async function signInAction(raw: unknown): Promise<ActionResult<{ signedIn: true }>> {
  if (clerkEnabled) return { ok: false, fieldErrors: {}, formError: 'Sign in with the hosted form.', status: 400 };
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, fieldErrors: fieldErrorsOf(parsed.error), formError: null, status: 400 };
  const user = await checkLocalCredentials(parsed.data.email, parsed.data.password);
  if (!user) return { ok: false, fieldErrors: {}, formError: 'That e-mail and password do not match a Dutywise user.', status: 401 };
  await startLocalSession(user.id, user.role);
  return { ok: true, data: { signedIn: true } };
}

export async function signOutAction(): Promise<void> {
  await endLocalSession();
  redirect('/');
}

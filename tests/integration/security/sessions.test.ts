import { describe, expect, it } from 'vitest';
import '../helpers/session';
import { signOutAction } from '@/app/(auth)/sign-in/actions';
import { setUserDisabled } from '@/lib/users/mutations';
import { getCurrentUser } from '@/lib/auth/current-user';
import { hashPassword } from '@/lib/auth/local/passwords';
import { requestPasswordReset, resetPassword } from '@/lib/auth/local/password-reset';
import { checkLocalCredentials } from '@/lib/auth/local/session';
import { LOCAL_SESSION_COOKIE } from '@/lib/auth/local/session-token';
import { db } from '@/db';
import { outbox } from '@/db/schema';
import { desc, eq } from 'drizzle-orm';
import { makeUser } from '../helpers/fixtures';
import { actAs, currentCookie, restoreCookie } from '../helpers/session';

// A session cookie is only as good as its server-side row: these end it everywhere at once, even for a copy of
// the cookie kept elsewhere (another device, or a thief).
describe('sessions end on the server', () => {
  it('sign-out ends the session: the same cookie presented again is signed out', async () => {
    const user = await makeUser('sales_engineer');
    await actAs(user);
    const copy = currentCookie(LOCAL_SESSION_COOKIE)!;
    expect((await getCurrentUser())?.id).toBe(user.id);
    await expect(signOutAction()).rejects.toThrow(/NEXT_REDIRECT/);
    restoreCookie(LOCAL_SESSION_COOKIE, copy);
    expect(await getCurrentUser()).toBeNull();
  });

  it('a password reset ends every session of the user, and the old password stops working', async () => {
    const user = await makeUser('customer', undefined, { passwordHash: await hashPassword('old-password-1') });
    await actAs(user);
    const copy = currentCookie(LOCAL_SESSION_COOKIE)!;
    await requestPasswordReset(user.email.toUpperCase());
    const [mail] = await db
      .select({ payload: outbox.payload })
      .from(outbox)
      .where(eq(outbox.toAddress, user.email))
      .orderBy(desc(outbox.createdAt))
      .limit(1);
    const token = String((mail!.payload as { resetUrl: string }).resetUrl)
      .split('/')
      .at(-1)!;
    expect(await resetPassword(token, 'new-password-22')).toBe(true);
    expect(await resetPassword(token, 'new-password-33')).toBe(false);
    expect((await checkLocalCredentials(user.email, 'old-password-1')).status).toBe('mismatch');
    expect((await checkLocalCredentials(user.email, 'new-password-22')).status).toBe('ok');
    restoreCookie(LOCAL_SESSION_COOKIE, copy);
    expect(await getCurrentUser()).toBeNull();
  });

  it('a reset asked for an unknown address sends nothing and says nothing different', async () => {
    const before = await db.select({ id: outbox.id }).from(outbox);
    await expect(requestPasswordReset('nobody-here@nowhere.example')).resolves.toBeUndefined();
    expect((await db.select({ id: outbox.id }).from(outbox)).length).toBe(before.length);
  });

  it('disabling a user ends their sessions at once', async () => {
    const admin = await makeUser('admin');
    const target = await makeUser('support');
    await actAs(target);
    const copy = currentCookie(LOCAL_SESSION_COOKIE)!;
    await setUserDisabled(admin, { userId: target.id, disabled: true });
    await setUserDisabled(admin, { userId: target.id, disabled: false });
    // Re-enabled, but the session that was open when it was disabled stays ended.
    restoreCookie(LOCAL_SESSION_COOKIE, copy);
    expect(await getCurrentUser()).toBeNull();
  });
});

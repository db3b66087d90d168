import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import '../helpers/session';
import { acceptInviteAction } from '@/app/(auth)/invite/[token]/actions';
import { signUpAction } from '@/app/(auth)/sign-up/actions';
import { db } from '@/db';
import { memberships, users } from '@/db/schema';
import { inviteMember } from '@/lib/accounts/mutations';
import { env } from '@/lib/env';
import { getInvitationPreview } from '@/lib/users/invitation-preview';
import { LOCAL_SESSION_COOKIE, verifyLocalSession } from '@/lib/auth/local/session-token';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { actAs, currentCookie } from '../helpers/session';

async function sessionSubject() {
  return (await verifyLocalSession(currentCookie(LOCAL_SESSION_COOKIE), env.SESSION_SECRET))?.sub;
}

describe('self-serve sign-up', () => {
  it('creates a customer, their own account and a session', async () => {
    await actAs(null);
    const email = `signup-${randomUUID().slice(0, 8)}@plant.example`;
    const res = await signUpAction({
      name: 'Ada Fenwick',
      email,
      password: 'long-enough-pw',
      company: 'Fenwick Kilns',
      site: '',
    });
    if (!res.ok) throw new Error(`sign-up refused: ${JSON.stringify(res.errors)}`);
    const [u] = await db.select({ id: users.id, role: users.role }).from(users).where(eq(users.email, email));
    expect(u?.role).toBe('customer');
    const [m] = await db.select().from(memberships).where(eq(memberships.userId, u!.id));
    expect(m?.accountId).toBe(res.data.accountId);
    expect(await sessionSubject()).toBe(u!.id);
  });

  it('answers 409 with an e-mail field error when the address is taken, and 400 for short passwords', async () => {
    await actAs(null);
    const existing = await makeUser('sales_engineer');
    const taken = await signUpAction({
      name: 'Dup',
      email: existing.email.toUpperCase(),
      password: 'long-enough-pw',
      company: 'Dup Co',
    });
    expect(taken).toMatchObject({ ok: false, status: 409 });
    if (!taken.ok)
      expect(taken.errors.filter((e) => e.path === 'email')).toEqual([
        { path: 'email', message: 'Already registered.' },
      ]);
    const short = await signUpAction({
      name: 'Short',
      email: 'short@plant.example',
      password: 'short',
      company: 'Short Co',
    });
    expect(short).toMatchObject({ ok: false, status: 400 });
    if (!short.ok) expect([...new Set(short.errors.map((e) => e.path))]).toEqual(['password']);
    expect(await sessionSubject()).toBeUndefined();
  });
});

describe('accepting an invitation', () => {
  it('previews, joins the inviting account once, and signs the new user in', async () => {
    const acct = await makeAccount('Inviting');
    const engineer = await makeUser('sales_engineer');
    const email = `invitee-${randomUUID().slice(0, 8)}@plant.example`;
    const { inviteUrl } = await inviteMember(engineer, { accountId: acct.id, email });
    const token = inviteUrl.split('/invite/')[1]!;
    expect(await getInvitationPreview(token)).toMatchObject({ email, accountName: acct.name });

    await actAs(null);
    expect(await acceptInviteAction({ token, name: 'New Member', password: 'long-enough-pw' })).toEqual({
      ok: true,
      data: { joined: true },
    });
    const [u] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
    const [m] = await db.select().from(memberships).where(eq(memberships.userId, u!.id));
    expect(m?.accountId).toBe(acct.id);
    expect(await sessionSubject()).toBe(u!.id);

    expect(await getInvitationPreview(token)).toBeNull();
    expect(await acceptInviteAction({ token, name: 'Again', password: 'long-enough-pw' })).toMatchObject({
      ok: false,
      status: 410,
    });
  });

  it('refuses an unknown token with 410 and a malformed one with 400', async () => {
    await actAs(null);
    expect(
      await acceptInviteAction({ token: 'x'.repeat(32), name: 'Nobody', password: 'long-enough-pw' }),
    ).toMatchObject({ ok: false, status: 410 });
    expect(await acceptInviteAction({ token: 'short', name: 'Nobody', password: 'long-enough-pw' })).toMatchObject({
      ok: false,
      status: 400,
    });
  });
});

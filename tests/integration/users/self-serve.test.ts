import { randomUUID } from 'node:crypto';
import { and, desc, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import '../helpers/session';
import { acceptInviteAction } from '@/app/(auth)/invite/[token]/actions';
import { signUpAction } from '@/app/(auth)/sign-up/actions';
import { verifyEmailAction } from '@/app/(auth)/verify/[token]/actions';
import { saveSizingAction } from '@/app/(desk)/size/actions';
import { db } from '@/db';
import { accounts, memberships, outbox, users } from '@/db/schema';
import { inviteMember } from '@/lib/accounts/mutations';
import { getCurrentUser } from '@/lib/auth/current-user';
import { checkLocalCredentials } from '@/lib/auth/local/session';
import { getInvitationPreview } from '@/lib/users/invitation-preview';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { actAs, actFrom } from '../helpers/session';

// Each sign-up names its own company: one company has one account (a second sign-up for it is refused).
const form = (email: string) => ({
  name: 'Ada Fenwick',
  email,
  password: 'long-enough-pw',
  company: `Fenwick Kilns ${randomUUID().slice(0, 6)}`,
});

async function lastMailTo(email: string) {
  const [row] = await db
    .select({ template: outbox.template, payload: outbox.payload })
    .from(outbox)
    .where(eq(outbox.toAddress, email))
    .orderBy(desc(outbox.createdAt))
    .limit(1);
  return row as { template: string; payload: Record<string, string> } | undefined;
}

const tokenOf = (url: string) => url.split('/').at(-1)!;

describe('self-serve sign-up', () => {
  it('creates an unverified customer and account, mails a one-time link, and activates only when it is followed', async () => {
    await actAs(null);
    const email = `signup-${randomUUID().slice(0, 8)}@plant.example`;
    const res = await signUpAction({ ...form(email), site: '' });
    expect(res).toEqual({ ok: true, data: { email } });
    const [u] = await db.select().from(users).where(eq(users.email, email));
    expect(u).toMatchObject({ role: 'customer', emailVerifiedAt: null });
    const [m] = await db.select().from(memberships).where(eq(memberships.userId, u!.id));
    const [acct] = await db.select().from(accounts).where(eq(accounts.id, m!.accountId));
    // The unverified address is not used for billing mail yet.
    expect(acct!.billingContactEmail).toBeNull();

    // Unverified: no session from sign-up, the password alone does not open a session, and a session cannot act.
    expect(await getCurrentUser()).toBeNull();
    expect(await checkLocalCredentials(email, 'long-enough-pw')).toMatchObject({ status: 'unverified' });
    await actAs(u!);
    expect(await getCurrentUser()).toBeNull();
    const saved = await saveSizingAction({ accountId: acct!.id, title: 'x', input: {} });
    expect(saved).toMatchObject({ ok: false, status: 401 });

    const mail = await lastMailTo(email);
    expect(mail?.template).toBe('verify-email');
    const token = tokenOf(mail!.payload.verifyUrl!);
    await actAs(null);
    expect(await verifyEmailAction({ token })).toEqual({ ok: true, data: { verified: true } });
    // One time only.
    expect(await verifyEmailAction({ token })).toMatchObject({ ok: false, status: 410 });
    const [after] = await db.select().from(users).where(eq(users.id, u!.id));
    expect(after!.emailVerifiedAt).not.toBeNull();
    const [acctAfter] = await db.select().from(accounts).where(eq(accounts.id, acct!.id));
    expect(acctAfter!.billingContactEmail).toBe(email);
    expect(await checkLocalCredentials(email, 'long-enough-pw')).toMatchObject({ status: 'ok' });
  });

  it('answers the same for an address that already has a sign-in, and mails its owner instead', async () => {
    await actAs(null);
    const existing = await makeUser('sales_engineer');
    const before = await db.select({ id: users.id }).from(users);
    const res = await signUpAction(form(existing.email.toUpperCase()));
    expect(res).toEqual({ ok: true, data: { email: existing.email.toUpperCase() } });
    expect((await db.select({ id: users.id }).from(users)).length).toBe(before.length);
    expect((await lastMailTo(existing.email))?.template).toBe('account-exists');
  });

  it('refuses a short password, one longer than bcrypt reads, and a name with a line break, naming the field', async () => {
    await actAs(null);
    const email = `short-${randomUUID().slice(0, 8)}@plant.example`;
    const short = await signUpAction({ ...form(email), password: 'short' });
    expect(short).toMatchObject({
      ok: false,
      status: 400,
      errors: [{ path: 'password', message: 'Use at least 10 characters.' }],
    });
    const long = await signUpAction({ ...form(email), password: 'é'.repeat(40) });
    expect(long).toMatchObject({ ok: false, status: 400 });
    if (!long.ok) expect(long.errors.find((e) => e.path === 'password')?.message).toMatch(/72 bytes/);
    const name = await signUpAction({ ...form(email), name: 'Ada\r\nBcc: x@example.com' });
    expect(name).toMatchObject({ ok: false, status: 400 });
    if (!name.ok) expect(name.errors.map((e) => e.path)).toEqual(['name']);
    expect(await db.select().from(users).where(eq(users.email, email))).toEqual([]);
  });

  it('limits sign-ups per client address', async () => {
    await actAs(null);
    actFrom(`203.0.113.${Math.floor(Math.random() * 250) + 1}`);
    const statuses: number[] = [];
    for (let i = 0; i < 12; i++) {
      const r = await signUpAction(form(`burst-${i}-${randomUUID().slice(0, 6)}@plant.example`));
      statuses.push(r.ok ? 200 : r.status);
    }
    expect(statuses.slice(0, 10).every((s) => s === 200)).toBe(true);
    expect(statuses.slice(10)).toEqual([429, 429]);
    actFrom(`198.18.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250) + 1}`);
  });
});

describe('accepting an invitation', () => {
  it('previews, joins the inviting account once as a verified user, and signs the new user in', async () => {
    const acct = await makeAccount('Inviting');
    const engineer = await makeUser('sales_engineer');
    const email = `invitee-${randomUUID().slice(0, 8)}@plant.example`;
    const { inviteUrl } = await inviteMember(engineer, { accountId: acct.id, email });
    const token = tokenOf(inviteUrl);
    expect(await getInvitationPreview(token)).toMatchObject({ email, accountName: acct.name });
    // The same link went to the invitee's inbox, and only there.
    expect((await lastMailTo(email))?.payload.inviteUrl).toBe(inviteUrl);

    await actAs(null);
    expect(await acceptInviteAction({ token, name: 'New Member', password: 'long-enough-pw' })).toEqual({
      ok: true,
      data: { joined: true },
    });
    const [u] = await db.select().from(users).where(eq(users.email, email));
    expect(u!.emailVerifiedAt).not.toBeNull();
    const [m] = await db
      .select()
      .from(memberships)
      .where(and(eq(memberships.userId, u!.id)));
    expect(m?.accountId).toBe(acct.id);
    expect((await getCurrentUser())?.id).toBe(u!.id);

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

import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import '../helpers/session';
import { changeUserRoleAction, setUserDisabledAction } from '@/app/(desk)/admin/actions';
import { db } from '@/db';
import { auditLog, users } from '@/db/schema';
import { loadUser } from '@/lib/auth/load-user';
import { changeUserRole, setUserDisabled } from '@/lib/users/mutations';
import { listUsers } from '@/lib/users/queries';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { actAs } from '../helpers/session';

async function roleOf(userId: string) {
  const [row] = await db
    .select({ role: users.role, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.id, userId));
  return row;
}

async function auditFor(userId: string) {
  return db
    .select()
    .from(auditLog)
    .where(and(eq(auditLog.entityType, 'user'), eq(auditLog.entityId, userId)));
}

describe('people and roles', () => {
  it('an admin changes a staff role and the change is audited with from, to and actor', async () => {
    const admin = await makeUser('admin');
    const engineer = await makeUser('sales_engineer');
    await expect(changeUserRole(admin, { userId: engineer.id, role: 'support' })).resolves.toEqual({ changed: true });
    expect((await roleOf(engineer.id))?.role).toBe('support');
    const entries = await auditFor(engineer.id);
    expect(entries.map((e) => e.action)).toEqual(['user.role_changed']);
    expect(entries[0]?.actorUserId).toBe(admin.id);
    expect(entries[0]?.detail).toMatchObject({ from: 'sales_engineer', to: 'support' });
  });

  it('setting the role a user already has changes nothing and writes no audit entry', async () => {
    const admin = await makeUser('admin');
    const support = await makeUser('support');
    await expect(changeUserRole(admin, { userId: support.id, role: 'support' })).resolves.toEqual({ changed: false });
    expect(await auditFor(support.id)).toHaveLength(0);
  });

  it('refuses to move a customer user to a staff role, or staff to customer', async () => {
    const admin = await makeUser('admin');
    const customer = await makeUser('customer', (await makeAccount()).id);
    const engineer = await makeUser('sales_engineer');
    await expect(changeUserRole(admin, { userId: customer.id, role: 'sales_engineer' })).rejects.toMatchObject({
      status: 422,
    });
    await expect(changeUserRole(admin, { userId: engineer.id, role: 'customer' })).rejects.toMatchObject({
      status: 422,
    });
    expect((await roleOf(customer.id))?.role).toBe('customer');
    expect((await roleOf(engineer.id))?.role).toBe('sales_engineer');
    expect(await auditFor(customer.id)).toHaveLength(0);
  });

  it('refuses an admin changing their own role or disabling their own sign-in', async () => {
    const admin = await makeUser('admin');
    await expect(changeUserRole(admin, { userId: admin.id, role: 'support' })).rejects.toMatchObject({ status: 409 });
    await expect(setUserDisabled(admin, { userId: admin.id, disabled: true })).rejects.toMatchObject({ status: 409 });
    expect(await roleOf(admin.id)).toMatchObject({ role: 'admin', disabledAt: null });
  });

  it('roles without users:manage cannot list people or change roles', async () => {
    const engineer = await makeUser('sales_engineer');
    const support = await makeUser('support');
    await expect(listUsers(support)).rejects.toMatchObject({ code: 'forbidden', status: 403 });
    await expect(changeUserRole(support, { userId: engineer.id, role: 'admin' })).rejects.toMatchObject({
      code: 'forbidden',
      status: 403,
    });
    expect((await roleOf(engineer.id))?.role).toBe('sales_engineer');
  });

  it('a disabled user no longer resolves as signed in; enabling restores them; both are audited', async () => {
    const admin = await makeUser('admin');
    const engineer = await makeUser('sales_engineer');
    await setUserDisabled(admin, { userId: engineer.id, disabled: true });
    expect(await loadUser({ id: engineer.id })).toBeNull();
    await setUserDisabled(admin, { userId: engineer.id, disabled: false });
    expect(await loadUser({ id: engineer.id })).toMatchObject({ id: engineer.id, role: 'sales_engineer' });
    expect((await auditFor(engineer.id)).map((e) => e.action).sort()).toEqual(['user.disabled', 'user.enabled']);
  });

  it('lists users with their customer account', async () => {
    const admin = await makeUser('admin');
    const acct = await makeAccount('Listed');
    const customer = await makeUser('customer', acct.id);
    const row = (await listUsers(admin)).find((u) => u.id === customer.id);
    expect(row).toMatchObject({ role: 'customer', accountId: acct.id, accountName: acct.name, disabledAt: null });
  });
});

describe('people and roles server actions', () => {
  it('answer 403 to support and 401 when signed out, changing nothing', async () => {
    const engineer = await makeUser('sales_engineer');
    await actAs(await makeUser('support'));
    expect(await changeUserRoleAction({ userId: engineer.id, role: 'admin' })).toMatchObject({
      ok: false,
      status: 403,
    });
    await actAs(null);
    expect(await setUserDisabledAction({ userId: engineer.id, disabled: true })).toMatchObject({
      ok: false,
      status: 401,
    });
    expect(await roleOf(engineer.id)).toMatchObject({ role: 'sales_engineer', disabledAt: null });
  });

  it('answer 400 with field errors for a malformed id or unknown role', async () => {
    await actAs(await makeUser('admin'));
    const res = await changeUserRoleAction({ userId: 'not-a-uuid', role: 'overlord' });
    expect(res).toMatchObject({ ok: false, status: 400 });
    if (!res.ok) expect([...new Set(res.errors.map((e) => e.path))].sort()).toEqual(['role', 'userId']);
  });

  it('change the role for an admin', async () => {
    const engineer = await makeUser('sales_engineer');
    await actAs(await makeUser('admin'));
    expect(await changeUserRoleAction({ userId: engineer.id, role: 'admin' })).toEqual({
      ok: true,
      data: { changed: true },
    });
    expect((await roleOf(engineer.id))?.role).toBe('admin');
  });
});

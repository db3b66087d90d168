import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { memberships, users } from '@/db/schema';
import { acceptInvitation } from '@/lib/accounts/mutations';
import { listUsers } from '@/lib/users/queries';
import { inviteStaff } from '@/lib/users/invite-staff';
import { makeUser } from '../helpers/fixtures';

describe('inviting staff with a role', () => {
  it('creates a sign-in in the invited role with no customer account, once', async () => {
    const admin = await makeUser('admin');
    const email = `staff-${randomUUID().slice(0, 8)}@vendor.example`;
    const { inviteUrl } = await inviteStaff(admin, { email, role: 'support' });
    await expect(inviteStaff(admin, { email, role: 'admin' })).rejects.toThrow(/still open/);
    const token = inviteUrl.split('/invite/')[1]!;
    const joined = await acceptInvitation(token, 'Rae Okonkwo', 'a-long-enough-password');
    expect(joined.role).toBe('support');
    const [row] = await db.select({ role: users.role }).from(users).where(eq(users.id, joined.userId));
    expect(row!.role).toBe('support');
    expect(await db.select().from(memberships).where(eq(memberships.userId, joined.userId))).toHaveLength(0);
    await expect(acceptInvitation(token, 'Again', 'a-long-enough-password')).rejects.toThrow(/not valid any more/);
    expect((await listUsers(admin, email.slice(0, 14))).map((u) => u.email)).toEqual([email]);
  });

  it('is for admins only', async () => {
    const engineer = await makeUser('sales_engineer');
    await expect(inviteStaff(engineer, { email: 'x@vendor.example', role: 'admin' })).rejects.toThrow(/does not allow/);
  });
});

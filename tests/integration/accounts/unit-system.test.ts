import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { users } from '@/db/schema';
import { updateAccount } from '@/lib/accounts/mutations';
import { getAccount } from '@/lib/accounts/queries';
import { makeAccount, makeUser } from '../helpers/fixtures';

describe("an account's unit system", () => {
  it('is kept on the account and becomes its members’ desk default', async () => {
    const acct = await makeAccount('Imperial works');
    const engineer = await makeUser('sales_engineer');
    const member = await makeUser('customer', acct.id);
    await updateAccount(engineer, acct.id, {
      name: acct.name,
      site: undefined,
      currency: 'USD',
      billingContactName: undefined,
      billingContactEmail: undefined,
      unitSystem: 'us',
    });
    expect((await getAccount(engineer, acct.id)).unitSystem).toBe('us');
    const [row] = await db.select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, member.id));
    expect(row!.unitSystem).toBe('us');
    const [staff] = await db.select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, engineer.id));
    expect(staff!.unitSystem).toBe('si');
  });
});

import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { accounts } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountScope } from '@/lib/auth/guards';
import type { AccountSite } from './account-types';

/** Accounts the user may size for (all for staff, their own for customers), with site pressure or altitude. */
export async function listAccountSites(user: CurrentUser): Promise<AccountSite[]> {
  const scope = accountScope(user);
  return db
    .select({
      id: accounts.id,
      name: accounts.name,
      barometricPressureKpa: accounts.barometricPressureKpa,
      siteAltitudeM: accounts.siteAltitudeM,
    })
    .from(accounts)
    .where(scope ? eq(accounts.id, scope) : undefined)
    .orderBy(asc(accounts.name))
    .limit(1000);
}

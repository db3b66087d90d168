import 'server-only';
import { and, asc, desc, eq, isNull, sql } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, invitations, memberships, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountScope, assertAccountAccess } from '@/lib/auth/guards';
import { isStaff } from '@/lib/auth/roles';
import type { SubscriptionState } from '@/lib/billing/labels';
import { AppError } from '@/lib/errors';
import { accountFigureColumns, subscriptionStateOf } from './figures';

export type AccountSummary = {
  id: string;
  name: string;
  site: string | null;
  memberCount: number;
  quoteCount: number;
  sizingCount: number;
  subscription: SubscriptionState;
};

/** Accounts the user may see: every account for staff, their own for customers. */
export async function listAccounts(user: CurrentUser): Promise<AccountSummary[]> {
  const scope = accountScope(user);
  const rows = await db
    .select({ id: accounts.id, name: accounts.name, site: accounts.site, ...accountFigureColumns(isStaff(user.role)) })
    .from(accounts)
    .where(scope ? eq(accounts.id, scope) : undefined)
    .orderBy(asc(accounts.name))
    .limit(500);
  return rows.map(({ subscription, ...a }) => ({ ...a, subscription: subscriptionStateOf(subscription) }));
}

export type AccountDetail = {
  id: string;
  name: string;
  site: string | null;
  billingContactName: string | null;
  billingContactEmail: string | null;
  barometricPressureKpa: number | null;
  siteAltitudeM: number | null;
  unitSystem: 'si' | 'us';
  currency: string;
  memberCount: number;
  quoteCount: number;
  sizingCount: number;
  subscription: SubscriptionState;
  members: { id: string; name: string; email: string }[];
  pendingInvitations: { id: string; email: string; expiresAt: Date }[];
};

export async function getAccount(user: CurrentUser, accountId: string): Promise<AccountDetail> {
  assertAccountAccess(user, accountId);
  const [row] = await db
    .select({
      id: accounts.id,
      name: accounts.name,
      site: accounts.site,
      billingContactName: accounts.billingContactName,
      billingContactEmail: accounts.billingContactEmail,
      barometricPressureKpa: accounts.barometricPressureKpa,
      siteAltitudeM: accounts.siteAltitudeM,
      unitSystem: accounts.unitSystem,
      currency: accounts.currency,
      ...accountFigureColumns(isStaff(user.role)),
    })
    .from(accounts)
    .where(eq(accounts.id, accountId))
    .limit(1);
  if (!row) throw new AppError('not_found', 'Not found');
  const members = await db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.accountId, accountId))
    .orderBy(asc(users.name));
  const pendingInvitations = await db
    .select({ id: invitations.id, email: invitations.email, expiresAt: invitations.expiresAt })
    .from(invitations)
    .where(
      and(eq(invitations.accountId, accountId), isNull(invitations.acceptedAt), sql`${invitations.expiresAt} > now()`),
    )
    .orderBy(desc(invitations.createdAt));
  return { ...row, subscription: subscriptionStateOf(row.subscription), members, pendingInvitations };
}

export type AccountOption = {
  id: string;
  name: string;
  site: string | null;
  billingContactEmail: string | null;
  barometricPressureKpa: number | null;
  siteAltitudeM: number | null;
  unitSystem: 'si' | 'us';
};

/**
 * Accounts for pickers (save-to-account, new quote), with the site and billing contact that tell same-named
 * accounts apart, and each site's barometric pressure or altitude and unit system for the desk.
 */
export async function listAccountOptions(user: CurrentUser): Promise<AccountOption[]> {
  const scope = accountScope(user);
  return db
    .select({
      id: accounts.id,
      name: accounts.name,
      site: accounts.site,
      billingContactEmail: accounts.billingContactEmail,
      barometricPressureKpa: accounts.barometricPressureKpa,
      siteAltitudeM: accounts.siteAltitudeM,
      unitSystem: accounts.unitSystem,
    })
    .from(accounts)
    .where(scope ? eq(accounts.id, scope) : undefined)
    .orderBy(asc(accounts.name))
    .limit(1000);
}

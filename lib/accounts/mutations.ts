import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import { db } from '@/db';
import { accounts, invitations, memberships, users } from '@/db/schema';
import { ActionError } from '@/lib/actions/define-action';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import type { UserRole } from '@/lib/auth/roles';
import { hashPassword } from '@/lib/auth/local/passwords';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import type { AccountInput, InviteInput } from './schema';

const INVITE_DAYS = 14;

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** Creates a customer account for a prospect (staff) and audits it in the same transaction. */
export async function createAccount(user: CurrentUser, input: AccountInput): Promise<{ id: string }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(accounts)
      .values({ ...input, createdByUserId: user.id })
      .returning({ id: accounts.id });
    if (!row) throw new Error('account insert returned no row');
    await writeAudit(tx, {
      actor: user,
      action: 'account.created',
      entityType: 'account',
      entityId: row.id,
      accountId: row.id,
      detail: { name: input.name },
    });
    return row;
  });
}

export async function updateAccount(user: CurrentUser, accountId: string, input: AccountInput): Promise<void> {
  assertAccountAccess(user, accountId);
  await db.transaction(async (tx) => {
    // An emptied field is cleared: undefined would leave the old value in place.
    const values = {
      name: input.name,
      site: input.site ?? null,
      billingContactName: input.billingContactName ?? null,
      billingContactEmail: input.billingContactEmail ?? null,
      barometricPressureKpa: input.barometricPressureKpa ?? null,
      siteAltitudeM: input.siteAltitudeM ?? null,
      unitSystem: input.unitSystem,
    };
    const res = await tx
      .update(accounts)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(accounts.id, accountId))
      .returning({ id: accounts.id });
    if (!res[0]) throw new ActionError('That account no longer exists.', 404);
    // The account's units are its people's desk defaults: members follow a change.
    await tx
      .update(users)
      .set({ unitSystem: input.unitSystem, updatedAt: new Date() })
      .where(
        and(
          sql`${users.id} in (select m.user_id from memberships m where m.account_id = ${accountId})`,
          sql`${users.unitSystem} <> ${input.unitSystem}`,
        ),
      );
    await writeAudit(tx, {
      actor: user,
      action: 'account.updated',
      entityType: 'account',
      entityId: accountId,
      accountId,
      detail: { fields: Object.keys(input) },
    });
  });
}

/** Invites a customer user by e-mail; the link carries a random token whose hash alone is stored. */
export async function inviteMember(user: CurrentUser, input: InviteInput): Promise<{ inviteUrl: string }> {
  assertAccountAccess(user, input.accountId);
  const token = randomBytes(24).toString('base64url');
  const inviteUrl = `${env.APP_URL}/invite/${token}`;
  await db.transaction(async (tx) => {
    const [acct] = await tx
      .select({ name: accounts.name })
      .from(accounts)
      .where(eq(accounts.id, input.accountId))
      .limit(1);
    if (!acct) throw new ActionError('That account no longer exists.', 404);
    const [inv] = await tx
      .insert(invitations)
      .values({
        accountId: input.accountId,
        email: input.email,
        tokenHash: hashToken(token),
        invitedByUserId: user.id,
        expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000),
      })
      .returning({ id: invitations.id });
    if (!inv) throw new Error('invitation insert returned no row');
    await writeAudit(tx, {
      actor: user,
      action: 'member.invited',
      entityType: 'account',
      entityId: input.accountId,
      accountId: input.accountId,
      detail: { email: input.email },
    });
    await enqueueEmail(tx, {
      template: 'invitation',
      to: input.email,
      accountId: input.accountId,
      entity: { type: 'invitation', id: inv.id },
      props: { accountName: acct.name, inviterName: user.name, inviteUrl, expiresInDays: INVITE_DAYS },
    });
  });
  return { inviteUrl };
}

/** Turns an invitation into a user (local identity): a customer of its account, or staff in its role. */
export async function acceptInvitation(
  token: string,
  name: string,
  password: string,
): Promise<{ userId: string; role: UserRole }> {
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const [inv] = await tx
      .select({
        id: invitations.id,
        accountId: invitations.accountId,
        role: invitations.role,
        email: invitations.email,
      })
      .from(invitations)
      .where(
        and(
          eq(invitations.tokenHash, hashToken(token)),
          isNull(invitations.acceptedAt),
          sql`${invitations.expiresAt} > now()`,
        ),
      )
      .for('update')
      .limit(1);
    if (!inv) throw new ActionError('This invitation is not valid any more. Ask for a new one.', 410);
    const [taken] = await tx
      .select({ id: users.id })
      .from(users)
      .where(eq(sql`lower(${users.email})`, inv.email.toLowerCase()))
      .limit(1);
    if (taken) throw new ActionError('A Dutywise user with this e-mail already exists; sign in instead.', 409);
    // A new member starts in the units their company works in.
    const [acct] = inv.accountId
      ? await tx
          .select({ unitSystem: accounts.unitSystem })
          .from(accounts)
          .where(eq(accounts.id, inv.accountId))
          .limit(1)
      : [];
    const [u] = await tx
      .insert(users)
      .values({ email: inv.email, name, role: inv.role, passwordHash, unitSystem: acct?.unitSystem ?? 'si' })
      .returning({ id: users.id });
    if (!u) throw new Error('user insert returned no row');
    if (inv.accountId) await tx.insert(memberships).values({ accountId: inv.accountId, userId: u.id });
    await tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, inv.id));
    await writeAudit(
      tx,
      inv.accountId
        ? {
            actor: { id: u.id, role: inv.role },
            action: 'member.joined',
            entityType: 'account',
            entityId: inv.accountId,
            accountId: inv.accountId,
            detail: { email: inv.email },
          }
        : {
            actor: { id: u.id, role: inv.role },
            action: 'user.joined',
            entityType: 'user',
            entityId: u.id,
            accountId: null,
            detail: { email: inv.email, role: inv.role },
          },
    );
    return { userId: u.id, role: inv.role };
  });
}

/** Self-serve sign-up: a customer user and their own account in one transaction. */
export async function signUpCustomer(input: {
  name: string;
  email: string;
  password: string;
  company: string;
  site?: string;
}) {
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    const [taken] = await tx
      .select({ id: users.id })
      .from(users)
      .where(eq(sql`lower(${users.email})`, input.email.toLowerCase()))
      .limit(1);
    if (taken)
      throw new ActionError('A Dutywise user with this e-mail already exists; sign in instead.', 409, {
        email: ['Already registered.'],
      });
    const [u] = await tx
      .insert(users)
      .values({ email: input.email, name: input.name, role: 'customer', passwordHash })
      .returning({ id: users.id });
    if (!u) throw new Error('user insert returned no row');
    const [a] = await tx
      .insert(accounts)
      .values({
        name: input.company,
        site: input.site,
        billingContactName: input.name,
        billingContactEmail: input.email,
        createdByUserId: u.id,
      })
      .returning({ id: accounts.id });
    if (!a) throw new Error('account insert returned no row');
    await tx.insert(memberships).values({ accountId: a.id, userId: u.id });
    await writeAudit(tx, {
      actor: { id: u.id, role: 'customer' },
      action: 'account.signed_up',
      entityType: 'account',
      entityId: a.id,
      accountId: a.id,
      detail: { company: input.company },
    });
    return { userId: u.id, accountId: a.id, role: 'customer' as const };
  });
}

import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import { db, type Tx } from '@/db';
import { accounts, invitations, memberships, users } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import type { UserRole } from '@/lib/auth/roles';
import { hashPassword } from '@/lib/auth/local/passwords';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { enforce } from '@/lib/ratelimit/limit';
import { PA_PER_PSI } from '@/lib/units';
import { accountsNamed } from './duplicates';
import type { AccountCreateInput, AccountInput, InviteInput } from './schema';

const INVITE_DAYS = 14;

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

const PSI_TO_KPA = PA_PER_PSI / 1000;

// The stored figures: a barometric pressure given in psia is kept in kPa.
function siteColumns(input: AccountInput) {
  const { barometricPressurePsia, ...rest } = input;
  const kpa = barometricPressurePsia !== undefined ? barometricPressurePsia * PSI_TO_KPA : input.barometricPressureKpa;
  return { ...rest, barometricPressureKpa: kpa };
}

/**
 * Creates a customer account for a prospect (staff) and audits it in the same transaction. A company name that
 * already exists is refused unless the user confirms this is a different company of the same name.
 */
export async function createAccount(user: CurrentUser, input: AccountCreateInput): Promise<{ id: string }> {
  return db.transaction(async (tx) => {
    const { confirmDuplicateName, ...fields } = input;
    const same = await accountsNamed(tx, fields.name);
    if (same.length && !confirmDuplicateName)
      throw new AppError(
        'conflict',
        `An account named “${same[0]!.name}”${same[0]!.site ? ` (${same[0]!.site})` : ''} already exists. Open it instead, or confirm that this is a different company.`,
        [
          { path: 'name', message: 'An account with this name already exists.' },
          { path: 'confirmDuplicateName', message: 'Confirm to create a second one.' },
        ],
      );
    const [row] = await tx
      .insert(accounts)
      .values({ ...siteColumns(fields), createdByUserId: user.id })
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
      barometricPressureKpa: siteColumns(input).barometricPressureKpa ?? null,
      siteAltitudeM: input.siteAltitudeM ?? null,
      unitSystem: input.unitSystem,
      currency: input.currency,
    };
    const res = await tx
      .update(accounts)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(accounts.id, accountId))
      .returning({ id: accounts.id });
    if (!res[0]) throw new AppError('not_found', 'That account no longer exists.');
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
  await enforce('invitations', ['invite.user', user.id], ['invite.account', input.accountId]);
  return db.transaction(async (tx) => {
    const [acct] = await tx
      .select({ name: accounts.name })
      .from(accounts)
      .where(eq(accounts.id, input.accountId))
      .limit(1);
    if (!acct) throw new AppError('not_found', 'That account no longer exists.');
    const { inviteUrl, invitationId } = await createInvitation(tx, user, input);
    await enqueueEmail(tx, {
      template: 'invitation',
      to: input.email,
      accountId: input.accountId,
      entity: { type: 'invitation', id: invitationId },
      props: { accountName: acct.name, inviterName: user.name, inviteUrl, expiresInDays: INVITE_DAYS },
    });
    return { inviteUrl };
  });
}

/**
 * Records an invitation to the account in the caller's transaction (audited) and returns its link; the caller
 * sends it (the invitation e-mail, or the quote e-mail to a billing contact who is not yet a member). `next` is
 * the app path the new member lands on after joining.
 */
export async function createInvitation(
  tx: Tx,
  user: CurrentUser,
  input: InviteInput,
  next?: string,
): Promise<{ inviteUrl: string; invitationId: string }> {
  const token = randomBytes(24).toString('base64url');
  const inviteUrl = `${env.APP_URL}/invite/${token}${next ? `?next=${encodeURIComponent(next)}` : ''}`;
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
    detail: { email: input.email, ...(next ? { next } : {}) },
  });
  return { inviteUrl, invitationId: inv.id };
}

/**
 * Whether anyone already signs in to Dutywise with this e-mail. Only a new address can take an invitation
 * (accepting one makes a user); an existing user reaches the quote by signing in.
 */
export async function hasUserWithEmail(tx: Tx, email: string): Promise<boolean> {
  const [row] = await tx
    .select({ id: users.id })
    .from(users)
    .where(eq(sql`lower(${users.email})`, email.toLowerCase()))
    .limit(1);
  return Boolean(row);
}

function liveInvitation(token: string) {
  return and(
    eq(invitations.tokenHash, hashToken(token)),
    isNull(invitations.acceptedAt),
    sql`${invitations.expiresAt} > now()`,
  );
}

const deadInvitation = () => new AppError('gone', 'This invitation is not valid any more. Ask for a new one.');

/**
 * Turns an invitation into a user (local identity): a customer of its account, or staff in its role. The token is checked before the
 * password is hashed. The invitation went to this address alone, so accepting it verifies the address.
 */
export async function acceptInvitation(
  token: string,
  name: string,
  password: string,
): Promise<{ userId: string; role: UserRole }> {
  const [open] = await db.select({ id: invitations.id }).from(invitations).where(liveInvitation(token)).limit(1);
  if (!open) throw deadInvitation();
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
      .where(liveInvitation(token))
      .for('update')
      .limit(1);
    if (!inv) throw deadInvitation();
    const [taken] = await tx
      .select({ id: users.id })
      .from(users)
      .where(eq(sql`lower(${users.email})`, inv.email.toLowerCase()))
      .limit(1);
    if (taken) throw new AppError('conflict', 'A Dutywise user with this e-mail already exists; sign in instead.');
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
      .values({
        email: inv.email,
        name,
        role: inv.role,
        passwordHash,
        unitSystem: acct?.unitSystem ?? 'si',
        // The invitation went to this address alone, so accepting it verifies the address.
        emailVerifiedAt: new Date(),
      })
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

import 'server-only';
import { and, eq, isNull, ne, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { memberships, users } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { closeAllSessions } from '@/lib/auth/local/session-store';
import { can, roleLabels } from '@/lib/auth/roles';
import { AppError } from '@/lib/errors';
import type { UnitSystemInput, UserDisableInput, UserRoleChangeInput } from './schema';

function assertManager(actor: CurrentUser): void {
  if (!can(actor.role, 'users:manage')) throw new AppError('forbidden', 'Your role does not allow this.');
}

// Serialises every change that can shrink the set of active admins, so two admins demoting or
// disabling each other at the same moment cannot leave nobody able to manage people.
async function lockAdminSet(tx: Tx): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext('dutywise:admin-set'))`);
}

async function loadTarget(tx: Tx, userId: string) {
  const [row] = await tx
    .select({ id: users.id, email: users.email, role: users.role, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.id, userId))
    .for('update')
    .limit(1);
  if (!row) throw new AppError('not_found', 'That user does not exist.');
  const [m] = await tx
    .select({ accountId: memberships.accountId })
    .from(memberships)
    .where(eq(memberships.userId, userId))
    .limit(1);
  return { ...row, accountId: m?.accountId ?? null };
}

async function countOtherActiveAdmins(tx: Tx, exceptUserId: string): Promise<number> {
  const [row] = await tx
    .select({ n: sql<number>`count(*)::int` })
    .from(users)
    .where(and(eq(users.role, 'admin'), isNull(users.disabledAt), ne(users.id, exceptUserId)));
  return row?.n ?? 0;
}

/** Changes a staff member's role and audits it in the same transaction. */
export async function changeUserRole(actor: CurrentUser, input: UserRoleChangeInput): Promise<{ changed: boolean }> {
  assertManager(actor);
  if (input.userId === actor.id)
    throw new AppError('conflict', 'You cannot change your own role; ask another admin.', [
      { path: 'role', message: 'Not for your own sign-in.' },
    ]);
  return db.transaction(async (tx) => {
    await lockAdminSet(tx);
    const target = await loadTarget(tx, input.userId);
    if (target.role === input.role) return { changed: false };
    // Customer users are bound to one customer account; turning one into staff would open every account to them.
    if (target.role === 'customer' || input.role === 'customer') {
      throw new AppError(
        'unprocessable',
        'Customer users keep the customer role: they belong to a customer account. Invite staff with their own sign-in instead.',
        [{ path: 'role', message: 'Only sales engineer, support and admin can be swapped.' }],
      );
    }
    if (target.role === 'admin' && !target.disabledAt && (await countOtherActiveAdmins(tx, target.id)) === 0) {
      throw new AppError('conflict', 'This is the last active admin; make someone else an admin first.', [
        { path: 'role', message: 'Last active admin.' },
      ]);
    }
    await tx.update(users).set({ role: input.role, updatedAt: new Date() }).where(eq(users.id, target.id));
    await writeAudit(tx, {
      actor,
      action: 'user.role_changed',
      entityType: 'user',
      entityId: target.id,
      accountId: target.accountId,
      detail: { email: target.email, from: target.role, to: input.role, toLabel: roleLabels[input.role] },
    });
    return { changed: true };
  });
}

/** Disables or re-enables a sign-in; a disabled user's sessions are deleted with it. */
export async function setUserDisabled(actor: CurrentUser, input: UserDisableInput): Promise<{ changed: boolean }> {
  assertManager(actor);
  if (input.userId === actor.id)
    throw new AppError('conflict', 'You cannot disable your own sign-in; ask another admin.');
  return db.transaction(async (tx) => {
    await lockAdminSet(tx);
    const target = await loadTarget(tx, input.userId);
    if (Boolean(target.disabledAt) === input.disabled) return { changed: false };
    if (input.disabled && target.role === 'admin' && (await countOtherActiveAdmins(tx, target.id)) === 0) {
      throw new AppError('conflict', 'This is the last active admin; make someone else an admin first.');
    }
    await tx
      .update(users)
      .set({ disabledAt: input.disabled ? new Date() : null, updatedAt: new Date() })
      .where(eq(users.id, target.id));
    // Every session of a disabled user ends now, not when it would have expired.
    if (input.disabled) await closeAllSessions(tx, target.id);
    await writeAudit(tx, {
      actor,
      action: input.disabled ? 'user.disabled' : 'user.enabled',
      entityType: 'user',
      entityId: target.id,
      accountId: target.accountId,
      detail: { email: target.email, role: target.role },
    });
    return { changed: true };
  });
}

/** Stores the signed-in user's unit system; the desk opens in it next time. */
export async function setUnitSystem(user: CurrentUser, input: UnitSystemInput): Promise<UnitSystemInput> {
  await db.update(users).set({ unitSystem: input.unitSystem, updatedAt: new Date() }).where(eq(users.id, user.id));
  return { unitSystem: input.unitSystem };
}

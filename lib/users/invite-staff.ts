import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { randomBytes } from 'node:crypto';
import { db } from '@/db';
import { invitations, users } from '@/db/schema';
import { hashToken } from '@/lib/accounts/mutations';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can, roleLabels } from '@/lib/auth/roles';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import type { StaffInviteInput } from './schema';
import { AppError } from '@/lib/errors';

const INVITE_DAYS = 7;

/**
 * Invites a staff member (sales engineer, support or admin) by e-mail: the link sets up their own sign-in in
 * that role. The token is random and only its hash is stored; the invitation, its audit entry and its e-mail
 * are written together.
 */
export async function inviteStaff(actor: CurrentUser, input: StaffInviteInput): Promise<{ inviteUrl: string }> {
  if (!can(actor.role, 'users:manage')) throw new AppError('forbidden', 'Your role does not allow this.');
  const token = randomBytes(24).toString('base64url');
  const inviteUrl = `${env.APP_URL}/invite/${token}`;
  await db.transaction(async (tx) => {
    const [taken] = await tx
      .select({ id: users.id })
      .from(users)
      .where(eq(sql`lower(${users.email})`, input.email.toLowerCase()))
      .limit(1);
    if (taken)
      throw new AppError(
        'conflict',
        'Someone already signs in with this e-mail; change their role in the list instead.',
        [{ path: 'email', message: 'Already a Dutywise user.' }],
      );
    const [open] = await tx
      .select({ id: invitations.id })
      .from(invitations)
      .where(
        and(
          eq(sql`lower(${invitations.email})`, input.email.toLowerCase()),
          isNull(invitations.acceptedAt),
          sql`${invitations.expiresAt} > now()`,
        ),
      )
      .limit(1);
    if (open)
      throw new AppError('conflict', 'An invitation to this e-mail is still open.', [
        { path: 'email', message: 'Already invited.' },
      ]);
    const [inv] = await tx
      .insert(invitations)
      .values({
        accountId: null,
        role: input.role,
        email: input.email,
        tokenHash: hashToken(token),
        invitedByUserId: actor.id,
        expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000),
      })
      .returning({ id: invitations.id });
    if (!inv) throw new Error('invitation insert returned no row');
    await writeAudit(tx, {
      actor,
      action: 'user.invited',
      entityType: 'invitation',
      entityId: inv.id,
      accountId: null,
      detail: { email: input.email, role: input.role },
    });
    await enqueueEmail(tx, {
      template: 'invitation',
      to: input.email,
      accountId: null,
      entity: { type: 'invitation', id: inv.id },
      props: {
        accountName: `the sizing team as ${roleLabels[input.role].toLowerCase()}`,
        inviterName: actor.name,
        inviteUrl,
        expiresInDays: INVITE_DAYS,
      },
    });
  });
  return { inviteUrl };
}

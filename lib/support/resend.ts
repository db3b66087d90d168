import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, datasheetRevisions, datasheets, sizings } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import { compareRevisionLetters } from '@/lib/datasheets/revision-letter';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import type { ResendInput } from './schema';

export type Resent = { to: string; datasheetNumber: string; revision: string };

/**
 * Queues a copy of a datasheet revision's notice (support): the revision and recipient are chosen, the subject
 * says it is a copy, and the mail is recorded against that revision so the record's e-mail history shows it.
 */
export async function resendDatasheetEmail(
  user: CurrentUser,
  input: Partial<ResendInput> & { sizingId: string },
): Promise<Resent> {
  const out = await db.transaction(async (tx) => {
    const [row] = await tx
      .select({
        datasheetId: datasheets.id,
        number: datasheets.number,
        accountId: datasheets.accountId,
        accountName: accounts.name,
        billingContact: accounts.billingContactEmail,
        title: sizings.title,
        tag: sizings.equipmentTag,
      })
      .from(datasheets)
      .innerJoin(accounts, eq(accounts.id, datasheets.accountId))
      .innerJoin(sizings, eq(sizings.id, datasheets.sizingId))
      .where(eq(datasheets.sizingId, input.sizingId))
      .limit(1);
    if (!row) throw new AppError('not_found', 'This sizing has no datasheet yet; nothing to resend.');
    assertAccountAccess(user, row.accountId);
    const revs = (
      await tx
        .select({ id: datasheetRevisions.id, revision: datasheetRevisions.revision })
        .from(datasheetRevisions)
        .where(eq(datasheetRevisions.datasheetId, row.datasheetId))
    ).sort((a, b) => compareRevisionLetters(a.revision, b.revision));
    const index = input.revisionId ? revs.findIndex((r) => r.id === input.revisionId) : revs.length - 1;
    const rev = revs[index];
    if (!rev)
      throw new AppError('unprocessable', 'Choose a revision of this datasheet.', [
        { path: 'revisionId', message: 'That revision is not one of this datasheet’s.' },
      ]);
    const to = input.to ?? row.billingContact;
    if (!to)
      throw new AppError('unprocessable', 'The customer account has no billing contact e-mail; enter the recipient.', [
        { path: 'to', message: 'Enter the address to send the copy to.' },
      ]);
    const supersededBy = revs[index + 1]?.revision ?? null;
    await enqueueEmail(tx, {
      template: 'datasheet-issued',
      to,
      accountId: row.accountId,
      entity: { type: 'datasheet_revision', id: rev.id },
      props: {
        accountName: row.accountName,
        datasheetNumber: row.number,
        revision: rev.revision,
        sizingTitle: row.title,
        equipmentTag: row.tag,
        datasheetUrl: `${env.APP_URL}/datasheets#${row.number}`,
        copy: true,
        supersededBy,
      },
    });
    await writeAudit(tx, {
      actor: user,
      action: 'datasheet.email_resent',
      entityType: 'sizing',
      entityId: input.sizingId,
      accountId: row.accountId,
      detail: { datasheet: row.number, revision: rev.revision, to },
    });
    return { to, datasheetNumber: row.number, revision: rev.revision };
  });
  return out;
}

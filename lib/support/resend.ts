import 'server-only';
import { and, desc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, datasheetRevisions, datasheets, sizings } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';

/** Queues the latest datasheet revision's e-mail again to the account's billing contact (support), audited. */
export async function resendDatasheetEmail(
  user: CurrentUser,
  sizingId: string,
): Promise<{ to: string; datasheetNumber: string; revision: string }> {
  const out = await db.transaction(async (tx) => {
    const [row] = await tx
      .select({
        datasheetId: datasheets.id,
        number: datasheets.number,
        accountId: datasheets.accountId,
        accountName: accounts.name,
        to: accounts.billingContactEmail,
        title: sizings.title,
        tag: sizings.equipmentTag,
      })
      .from(datasheets)
      .innerJoin(accounts, eq(accounts.id, datasheets.accountId))
      .innerJoin(sizings, eq(sizings.id, datasheets.sizingId))
      .where(eq(datasheets.sizingId, sizingId))
      .limit(1);
    if (!row) throw new AppError('not_found', 'This sizing has no datasheet yet; nothing to resend.');
    if (!row.to) throw new AppError('unprocessable', 'The customer account has no billing contact e-mail to send to.');
    const [rev] = await tx
      .select({ revision: datasheetRevisions.revision })
      .from(datasheetRevisions)
      .where(and(eq(datasheetRevisions.datasheetId, row.datasheetId)))
      .orderBy(desc(datasheetRevisions.issuedAt))
      .limit(1);
    if (!rev) throw new AppError('not_found', 'The datasheet has no issued revision.');
    await enqueueEmail(tx, {
      template: 'datasheet-issued',
      to: row.to,
      accountId: row.accountId,
      entity: { type: 'datasheet', id: row.datasheetId },
      props: {
        accountName: row.accountName,
        datasheetNumber: row.number,
        revision: rev.revision,
        sizingTitle: row.title,
        equipmentTag: row.tag,
        datasheetUrl: `${env.APP_URL}/datasheets`,
      },
    });
    await writeAudit(tx, {
      actor: user,
      action: 'datasheet.email_resent',
      entityType: 'sizing',
      entityId: sizingId,
      accountId: row.accountId,
      detail: { datasheet: row.number, revision: rev.revision, to: row.to },
    });
    return { to: row.to, datasheetNumber: row.number, revision: rev.revision };
  });
  return out;
}

import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import { datasheetRevisions, datasheets, users } from '@/db/schema';
import { AppError } from '@/lib/errors';

/**
 * A datasheet the vendor issued is the vendor's document: only vendor staff issue its next revision. A customer
 * may issue (and revise) datasheets of their own sizings that no one at the vendor has issued. A revision whose
 * issuer is no longer known counts as the vendor's.
 */
export async function assertCustomerMayIssue(sizingId: string): Promise<void> {
  const [vendorIssued] = await db
    .select({ id: datasheetRevisions.id })
    .from(datasheetRevisions)
    .innerJoin(datasheets, eq(datasheets.id, datasheetRevisions.datasheetId))
    .leftJoin(users, eq(users.id, datasheetRevisions.issuedByUserId))
    .where(and(eq(datasheets.sizingId, sizingId), sql`coalesce(${users.role}::text, 'admin') <> 'customer'`))
    .limit(1);
  if (vendorIssued)
    throw new AppError(
      'forbidden',
      'Your vendor issued this datasheet, so its revisions come from them: ask your sales engineer for a new revision.',
    );
}

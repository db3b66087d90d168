import 'server-only';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db';
import { datasheetRevisions, datasheets } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can, isStaff } from '@/lib/auth/roles';
import { getEntitlement } from '@/lib/billing/entitlements';
import { getBlobStore, sha256Hex, type BlobStore } from '@/lib/blob';
import { AppError } from '@/lib/errors';
import { logger } from '@/lib/log/logger';

export type DownloadOutcome =
  | { status: 'ok'; bytes: Buffer; fileName: string; sha256: string; number: string; revision: string }
  | { status: 'locked'; message: string }
  | { status: 'not-found' };

export const LOCKED_MESSAGE =
  'Datasheets for this account unlock with an active subscription. Subscribe on the billing page (/billing) to download them.';

/** Stored bytes that are missing or no longer match their recorded SHA-256: never served. */
export class DatasheetIntegrityError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'DatasheetIntegrityError';
  }
}

/**
 * The stored bytes of an issued document, checked against the SHA-256 recorded when it was issued; missing or
 * altered bytes are logged and refused (`what` names the document in the message, e.g. "DS26-0501 rev. A").
 */
export async function readIssuedBytes(
  store: BlobStore,
  stored: { blobKey: string; sha256: string },
  what: string,
): Promise<Buffer> {
  const blob = await store.get(stored.blobKey);
  if (blob && sha256Hex(blob.bytes) === stored.sha256) return blob.bytes;
  logger.error({ blobKey: stored.blobKey, found: Boolean(blob), what }, 'issued document bytes missing or altered');
  throw new DatasheetIntegrityError(`The stored file of ${what} is missing or does not match its recorded SHA-256.`);
}

/** '<number>-rev<letter>.pdf', the name a download is saved under. */
export function downloadFileName(number: string, revision: string): string {
  return `${number}-rev${revision}.pdf`;
}

/**
 * One revision's bytes after authorisation: staff always; customers only for their own account (any
 * other id answers not-found) and only while entitled ('locked' otherwise). Each served download is audited.
 */
export async function getRevisionDownload(
  user: CurrentUser,
  revisionId: string,
  opts: { store?: BlobStore } = {},
): Promise<DownloadOutcome> {
  if (!can(user.role, 'datasheet:read'))
    throw new AppError('forbidden', 'Your role does not allow reading datasheets.');
  if (!z.uuid().safeParse(revisionId).success) return { status: 'not-found' };
  const [row] = await db
    .select({
      id: datasheetRevisions.id,
      revision: datasheetRevisions.revision,
      blobKey: datasheetRevisions.blobKey,
      sha256: datasheetRevisions.sha256,
      number: datasheets.number,
      accountId: datasheets.accountId,
    })
    .from(datasheetRevisions)
    .innerJoin(datasheets, eq(datasheets.id, datasheetRevisions.datasheetId))
    .where(eq(datasheetRevisions.id, revisionId))
    .limit(1);
  if (!row) return { status: 'not-found' };
  if (!isStaff(user.role)) {
    if (user.accountId !== row.accountId) return { status: 'not-found' };
    if (!(await getEntitlement(row.accountId)).unlocked) return { status: 'locked', message: LOCKED_MESSAGE };
  }
  const bytes = await readIssuedBytes(opts.store ?? getBlobStore(), row, `${row.number} rev. ${row.revision}`);
  await db.transaction(async (tx) => {
    await writeAudit(tx, {
      actor: user,
      action: 'datasheet.downloaded',
      entityType: 'datasheet_revision',
      entityId: row.id,
      accountId: row.accountId,
      detail: { number: row.number, revision: row.revision, sha256: row.sha256 },
    });
  });
  return {
    status: 'ok',
    bytes,
    fileName: downloadFileName(row.number, row.revision),
    sha256: row.sha256,
    number: row.number,
    revision: row.revision,
  };
}

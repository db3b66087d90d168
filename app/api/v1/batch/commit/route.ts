import { requireUser } from '@/lib/auth/guards';
import { saveBatch } from '@/lib/batch/commit';
import { parseBatchTarget, readBatchCommit } from '@/lib/batch/read-request';
import { guarded } from '@/lib/http/guarded';

export const runtime = 'nodejs';

/** Saves the rows that passed the last check as sizings (and quote lines) plus the original file, in one transaction. */
export const POST = guarded(async (req) => {
  const user = await requireUser('batch:upload');
  const { file, sheetRows, rows, target } = await readBatchCommit(req);
  return Response.json(await saveBatch(user, parseBatchTarget(target), rows, file, sheetRows));
});

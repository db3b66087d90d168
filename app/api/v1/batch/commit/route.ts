import { requireUser } from '@/lib/auth/guards';
import { admitBatch } from '@/lib/batch/guard';
import { saveBatch } from '@/lib/batch/commit';
import { parseBatchTarget, readBatchRequest } from '@/lib/batch/read-request';
import { guarded } from '@/lib/http/guarded';

export const runtime = 'nodejs';

/** Saves a checked sheet: the sized rows as sizings (and quote lines) plus the original file, in one transaction. */
export const POST = guarded(async (req) => {
  const user = await requireUser('batch:upload');
  await admitBatch(user);
  const { sheet, file, target } = await readBatchRequest(req);
  if (sheet.problems.length)
    return Response.json({ errors: sheet.problems.map((message) => ({ path: 'file', message })) }, { status: 422 });
  return Response.json(await saveBatch(user, parseBatchTarget(target), sheet.rows, file));
});

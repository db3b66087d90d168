import { requireUser } from '@/lib/auth/guards';
import { admitBatch } from '@/lib/batch/guard';
import { saveBatch } from '@/lib/batch/commit';
import { parseBatchTarget, readBatchCommit } from '@/lib/batch/read-request';
import { defineHandler } from '@/lib/http/define-handler';

export const runtime = 'nodejs';

/** Saves the rows that passed the last check as sizings (and quote lines) plus the original file, in one transaction. */
export const POST = defineHandler(
  async (req) => {
    const user = await requireUser('batch:upload');
    await admitBatch(user);
    const { file, sheetRows, rows, target } = await readBatchCommit(req);
    return Response.json(await saveBatch(user, parseBatchTarget(target), rows, file, sheetRows));
  },
  { name: 'batch.save_sheet' },
);

import { requireUser } from '@/lib/auth/guards';
import { admitBatch } from '@/lib/batch/guard';
import { saveBatch } from '@/lib/batch/commit';
import { parseBatchTarget, readBatchRequest, sheetProblems } from '@/lib/batch/read-request';
import { defineHandler } from '@/lib/http/define-handler';

export const runtime = 'nodejs';

/** Saves a checked sheet: the sized rows as sizings (and quote lines) plus the original file, in one transaction. */
export const POST = defineHandler(
  async (req) => {
    const user = await requireUser('batch:upload');
    await admitBatch(user);
    const { sheet, file, target } = await readBatchRequest(req);
    if (sheet.problems.length) throw sheetProblems(sheet.problems);
    return Response.json(await saveBatch(user, parseBatchTarget(target), sheet.rows, file));
  },
  { name: 'batch.save_sheet' },
);

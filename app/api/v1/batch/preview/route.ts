import { requireUser } from '@/lib/auth/guards';
import { admitBatch } from '@/lib/batch/guard';
import { evaluateSheet } from '@/lib/batch/evaluate';
import { readBatchRequest, sheetProblems } from '@/lib/batch/read-request';
import { defineHandler } from '@/lib/http/define-handler';

export const runtime = 'nodejs';

/** Sizes an uploaded sheet without saving anything: sized rows and per-row, per-column problems. */
export const POST = defineHandler(
  async (req) => {
    await admitBatch(await requireUser('batch:upload'));
    const { sheet } = await readBatchRequest(req);
    if (sheet.problems.length) throw sheetProblems(sheet.problems);
    const rows = evaluateSheet(sheet.rows);
    return Response.json({
      rows,
      sized: rows.filter((r) => r.result).length,
      withProblems: rows.filter((r) => r.problems.length).length,
    });
  },
  { name: 'batch.preview_sheet' },
);

import { requireUser } from '@/lib/auth/guards';
import { admitBatch } from '@/lib/batch/guard';
import { evaluateSheet } from '@/lib/batch/evaluate';
import { readBatchCheck, sheetProblems } from '@/lib/batch/read-request';
import { toRowView } from '@/lib/batch/view';
import { defineHandler } from '@/lib/http/define-handler';

export const runtime = 'nodejs';

/**
 * Checks rows without saving anything: each row's problems (per column), headline figure and warnings. The desk
 * sends the sheet in chunks of {row, cells} to show progress; a whole CSV file may be sent instead.
 */
export const POST = defineHandler(
  async (req) => {
    await admitBatch(await requireUser('batch:upload'));
    const sheet = await readBatchCheck(req);
    if (sheet.problems.length) throw sheetProblems(sheet.problems);
    const rows = evaluateSheet(sheet.rows).map(toRowView);
    return Response.json({
      rows,
      sized: rows.filter((r) => r.figures).length,
      withProblems: rows.filter((r) => r.problems.length).length,
    });
  },
  { name: 'batch.preview_sheet' },
);

import { requireUser } from '@/lib/auth/guards';
import { evaluateSheet } from '@/lib/batch/evaluate';
import { readBatchCheck } from '@/lib/batch/read-request';
import { toRowView } from '@/lib/batch/view';
import { guarded } from '@/lib/http/guarded';

export const runtime = 'nodejs';

/**
 * Checks rows without saving anything: each row's problems (per column), headline figure and warnings. The desk
 * sends the sheet in chunks of {row, cells} to show progress; a whole CSV file may be sent instead.
 */
export const POST = guarded(async (req) => {
  await requireUser('batch:upload');
  const sheet = await readBatchCheck(req);
  if (sheet.problems.length)
    return Response.json({ errors: sheet.problems.map((message) => ({ path: 'file', message })) }, { status: 422 });
  const rows = evaluateSheet(sheet.rows).map(toRowView);
  return Response.json({
    rows,
    sized: rows.filter((r) => r.figures).length,
    withProblems: rows.filter((r) => r.problems.length).length,
  });
});

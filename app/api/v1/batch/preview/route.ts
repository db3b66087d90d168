import { requireUser } from '@/lib/auth/guards';
import { admitBatch } from '@/lib/batch/guard';
import { evaluateSheet } from '@/lib/batch/evaluate';
import { readBatchRequest } from '@/lib/batch/read-request';
import { guarded } from '@/lib/http/guarded';

export const runtime = 'nodejs';

/** Sizes an uploaded sheet without saving anything: sized rows and per-row, per-column problems. */
export const POST = guarded(async (req) => {
  await admitBatch(await requireUser('batch:upload'));
  const { sheet } = await readBatchRequest(req);
  if (sheet.problems.length)
    return Response.json({ errors: sheet.problems.map((message) => ({ path: 'file', message })) }, { status: 422 });
  const rows = evaluateSheet(sheet.rows);
  return Response.json({
    rows,
    sized: rows.filter((r) => r.result).length,
    withProblems: rows.filter((r) => r.problems.length).length,
  });
});

import { z } from 'zod';
import { ActionError } from '@/lib/actions/define-action';
import { requireUser } from '@/lib/auth/guards';
import { saveBatch } from '@/lib/batch/commit';
import { readBatchRequest } from '@/lib/batch/read-request';
import { guarded } from '@/lib/http/guarded';

export const runtime = 'nodejs';

const targetSchema = z.object({
  accountId: z.uuid({ message: 'Choose the customer account.' }),
  quoteId: z.uuid().optional(),
  newQuoteTitle: z.string().trim().min(3).max(160).optional(),
});

function parseTarget(raw: string | null) {
  let value: unknown = null;
  try {
    value = raw ? JSON.parse(raw) : null;
  } catch {
    value = null;
  }
  const parsed = targetSchema.safeParse(value);
  if (!parsed.success)
    throw new ActionError('Say where to save: the "target" field needs a customer account.', 400, {
      target: parsed.error.issues.map((i) => i.message),
    });
  return parsed.data;
}

/** Saves a checked sheet: the sized rows as sizings (and quote lines) plus the original file, in one transaction. */
export const POST = guarded(async (req) => {
  const user = await requireUser('batch:upload');
  const { sheet, file, target } = await readBatchRequest(req);
  if (sheet.problems.length)
    return Response.json({ errors: sheet.problems.map((message) => ({ path: 'file', message })) }, { status: 422 });
  return Response.json(await saveBatch(user, parseTarget(target), sheet.rows, file));
});

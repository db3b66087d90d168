import { z } from 'zod';
import { requireUser } from '@/lib/auth/guards';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { pdfDownloadResponse } from '@/lib/http/pdf-download';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MISSING = 'No such datasheet revision.';

const download = defineHandler(
  async (req, { params }) => {
    const user = await requireUser('datasheet:read');
    const { revisionId = '' } = await params;
    if (!z.uuid().safeParse(revisionId).success) throw new AppError('not_found', MISSING);
    return pdfDownloadResponse(req, await getRevisionDownload(user, revisionId), MISSING, 'datasheet');
  },
  { name: 'datasheet.download' },
);

/** One issued revision as a PDF attachment, after the same authorisation the desk applies (401, 404, 402, 200). */
export function GET(req: Request, ctx: { params: Promise<{ revisionId: string }> }): Promise<Response> {
  // Typed with this route's own params so Next's route type check accepts it; `defineHandler` maps errors to statuses.
  return download(req, ctx);
}

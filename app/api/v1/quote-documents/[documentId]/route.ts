import { z } from 'zod';
import { requireUser } from '@/lib/auth/guards';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { pdfDownloadResponse } from '@/lib/http/pdf-download';
import { getQuoteDocumentDownload } from '@/lib/quotes/document/download';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MISSING = 'No such quote PDF.';

const download = defineHandler(
  async (req, { params }) => {
    const user = await requireUser('quote:read');
    const { documentId = '' } = await params;
    if (!z.uuid().safeParse(documentId).success) throw new AppError('not_found', MISSING);
    return pdfDownloadResponse(req, await getQuoteDocumentDownload(user, documentId), MISSING, 'quote-pdf');
  },
  { name: 'quote.download_document' },
);

/** One stored edition of a quote PDF, gated as datasheet downloads are (401, 404, 402 or a page, 200). */
export function GET(req: Request, ctx: { params: Promise<{ documentId: string }> }): Promise<Response> {
  return download(req, ctx);
}

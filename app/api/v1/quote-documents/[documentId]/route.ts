import { z } from 'zod';
import { requireUser } from '@/lib/auth/guards';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { errorResponse } from '@/lib/http/respond';
import { getQuoteDocumentDownload } from '@/lib/quotes/document/download';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const missing = () => new AppError('not_found', 'No such quote PDF.');

/** A person who opened the link in a browser (not a script) gets a page, not a JSON body. */
const wantsPage = (req: Request) => (req.headers.get('accept') ?? '').includes('text/html');

const download = defineHandler(
  async (req, { params }) => {
    const user = await requireUser('quote:read');
    const { documentId = '' } = await params;
    if (!z.uuid().safeParse(documentId).success) throw missing();
    const out = await getQuoteDocumentDownload(user, documentId);
    if (out.status === 'not-found') throw missing();
    if (out.status === 'locked') {
      if (wantsPage(req))
        return new Response(null, {
          status: 303,
          headers: { Location: '/billing?locked=quote-pdf', 'Cache-Control': 'no-store' },
        });
      return errorResponse(new AppError('payment_required', out.message), { billingUrl: '/billing' });
    }
    return new Response(new Uint8Array(out.bytes), {
      status: 200,
      headers: {
        'Content-Type': 'application/pdf',
        'Content-Length': String(out.bytes.byteLength),
        'Content-Disposition': `attachment; filename="${out.fileName}"`,
        'Cache-Control': 'private, no-store',
        'X-Content-SHA256': out.sha256,
        'X-Content-Type-Options': 'nosniff',
      },
    });
  },
  { name: 'quote.download_document' },
);

/** One stored edition of a quote PDF, gated as datasheet downloads are (401, 404, 402 or a page, 200). */
export function GET(req: Request, ctx: { params: Promise<{ documentId: string }> }): Promise<Response> {
  return download(req, ctx);
}

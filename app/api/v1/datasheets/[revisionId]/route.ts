import { z } from 'zod';
import { requireUser } from '@/lib/auth/guards';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { errorResponse } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const missing = () => new AppError('not_found', 'No such datasheet revision.');

/** A person who opened the link in a browser (not a script) gets a page, not a JSON body. */
const wantsPage = (req: Request) => (req.headers.get('accept') ?? '').includes('text/html');

const download = defineHandler(
  async (req, { params }) => {
    const user = await requireUser('datasheet:read');
    const { revisionId = '' } = await params;
    if (!z.uuid().safeParse(revisionId).success) throw missing();
    const out = await getRevisionDownload(user, revisionId);
    if (out.status === 'not-found') throw missing();
    if (out.status === 'locked') {
      if (wantsPage(req))
        return new Response(null, {
          status: 303,
          headers: { Location: '/billing?locked=datasheet', 'Cache-Control': 'no-store' },
        });
      // The one answer with a field beyond `errors`: where to subscribe.
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
  { name: 'datasheet.download' },
);

/** One issued revision as a PDF attachment, after the same authorisation the desk applies (401, 404, 402, 200). */
export function GET(req: Request, ctx: { params: Promise<{ revisionId: string }> }): Promise<Response> {
  // Typed with this route's own params so Next's route type check accepts it; `defineHandler` maps errors to statuses.
  return download(req, ctx);
}

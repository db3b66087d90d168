import { z } from 'zod';
import { requireUser } from '@/lib/auth/guards';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { AppError } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { errorResponse } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const missing = () => new AppError('not_found', 'No such datasheet revision.');

const download = defineHandler(
  async (_req, { params }) => {
    const user = await requireUser('datasheet:read');
    const { revisionId = '' } = await params;
    if (!z.uuid().safeParse(revisionId).success) throw missing();
    const out = await getRevisionDownload(user, revisionId);
    if (out.status === 'not-found') throw missing();
    // The one answer with a field beyond `errors`: where to subscribe.
    if (out.status === 'locked')
      return errorResponse(new AppError('payment_required', out.message), { billingUrl: '/billing' });
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

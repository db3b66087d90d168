import { z } from 'zod';
import { requireUser } from '@/lib/auth/guards';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { guarded } from '@/lib/http/guarded';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const fail = (status: number, message: string, extra: Record<string, unknown> = {}) =>
  Response.json({ errors: [{ path: '', message }], ...extra }, { status, headers: { 'Cache-Control': 'no-store' } });

/** A person who opened the link in a browser (not a script) gets a page, not a JSON body. */
const wantsPage = (req: Request) => (req.headers.get('accept') ?? '').includes('text/html');

const download = guarded(async (req, { params }) => {
  const user = await requireUser('datasheet:read');
  const { revisionId = '' } = await params;
  if (!z.uuid().safeParse(revisionId).success) return fail(404, 'No such datasheet revision.');
  const out = await getRevisionDownload(user, revisionId);
  if (out.status === 'not-found') return fail(404, 'No such datasheet revision.');
  if (out.status === 'locked') {
    if (wantsPage(req))
      return new Response(null, {
        status: 303,
        headers: { Location: '/billing?locked=datasheet', 'Cache-Control': 'no-store' },
      });
    return fail(402, out.message, { billingUrl: '/billing' });
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
});

/** One issued revision as a PDF attachment, after the same authorisation the desk applies (401, 404, 402, 200). */
export function GET(req: Request, ctx: { params: Promise<{ revisionId: string }> }): Promise<Response> {
  // Typed with this route's own params so Next's route type check accepts it; `guarded` maps errors to statuses.
  return download(req, ctx);
}

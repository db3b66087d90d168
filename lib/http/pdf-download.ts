import 'server-only';
import { AppError } from '@/lib/errors';
import { errorResponse } from './respond';

/** What a stored-document look-up answers: the bytes, locked behind the subscription, or nothing to show. */
export type PdfDownload =
  | { status: 'ok'; bytes: Buffer; fileName: string; sha256: string }
  | { status: 'locked'; message: string }
  | { status: 'not-found' };

/** A person who opened the link in a browser (not a script) gets a page, not a JSON body. */
const wantsPage = (req: Request) => (req.headers.get('accept') ?? '').includes('text/html');

/**
 * The answer to a stored PDF's download link, the same for datasheets and quote PDFs: 404 with `missing`, 402 with
 * where to subscribe (a browser is sent to the billing page with `lockedReason`), or the bytes as an attachment
 * with their SHA-256.
 */
export function pdfDownloadResponse(req: Request, out: PdfDownload, missing: string, lockedReason: string): Response {
  if (out.status === 'not-found') throw new AppError('not_found', missing);
  if (out.status === 'locked') {
    if (wantsPage(req))
      return new Response(null, {
        status: 303,
        headers: { Location: `/billing?locked=${lockedReason}`, 'Cache-Control': 'no-store' },
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
}

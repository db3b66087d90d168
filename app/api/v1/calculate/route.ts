import { readJsonBody } from '@/lib/http/json';
import { limitRequest } from '@/lib/ratelimit/guard-request';
import { logger } from '@/lib/log/logger';
import { SizingInputError, calculate } from '@/lib/engine';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_BODY_BYTES = 64 * 1024;

/** Public sizing endpoint: 200 with the result, 400 with every refused field, 413 above 64 KiB, 429 over the rate limit. */
export async function POST(req: Request): Promise<Response> {
  const limited = await limitRequest(req, 'calculate');
  if (limited) return limited;
  const body = await readJsonBody(req, MAX_BODY_BYTES);
  if (!body.ok) return body.response;
  try {
    return Response.json(calculate(body.value), { headers: { 'Cache-Control': 'no-store' } });
  } catch (err) {
    if (err instanceof SizingInputError) return Response.json({ errors: err.issues }, { status: 400 });
    logger.error({ err }, 'calculate failed');
    return Response.json(
      {
        errors: [
          { path: '', message: 'The calculation failed on our side; nothing is wrong with the request format.' },
        ],
      },
      { status: 500 },
    );
  }
}

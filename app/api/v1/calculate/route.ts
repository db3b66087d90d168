import { recordKeyUse } from '@/lib/api-keys/authenticate';
import { SizingInputError, calculate } from '@/lib/engine';
import { admitCaller } from '@/lib/http/admit-caller';
import { readJsonBody } from '@/lib/http/json';
import { logger } from '@/lib/log/logger';
import { isDatabaseDown } from '@/lib/ops/db-errors';
import { unavailableJson } from '@/lib/ops/unavailable';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_BODY_BYTES = 64 * 1024;

type Answer = { response: Response; service?: string };

async function answer(req: Request, headers: Record<string, string>): Promise<Answer> {
  const body = await readJsonBody(req, MAX_BODY_BYTES);
  if (!body.ok) return { response: body.response };
  try {
    const result = calculate(body.value);
    return {
      response: Response.json(result, { headers: { 'Cache-Control': 'no-store', ...headers } }),
      service: result.service,
    };
  } catch (err) {
    if (err instanceof SizingInputError)
      return { response: Response.json({ errors: err.issues }, { status: 400, headers }) };
    logger.error({ err }, 'calculate failed');
    return {
      response: Response.json(
        {
          errors: [
            { path: '', message: 'The calculation failed on our side; nothing is wrong with the request format.' },
          ],
        },
        { status: 500, headers },
      ),
    };
  }
}

/**
 * Public sizing endpoint: 200 with the result, 400 with every refused field, 401 for an invalid API key, 413 above
 * 64 KiB, 429 past the caller's limit (per API key, per signed-in user, or per address for anonymous callers).
 */
export async function POST(req: Request): Promise<Response> {
  const admitted = await admitCaller(req);
  if (!admitted.ok) return admitted.response;
  const { response, service } = await answer(req, admitted.headers);
  if (admitted.caller.kind !== 'api-key') return response;
  // A keyed request is counted for its day and attributed to its account in the audit trail.
  try {
    await recordKeyUse(admitted.caller.key, { status: response.status, service });
  } catch (err) {
    if (isDatabaseDown(err)) return unavailableJson();
    throw err;
  }
  return response;
}

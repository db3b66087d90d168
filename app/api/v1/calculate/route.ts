import { recordKeyUse } from '@/lib/api-keys/authenticate';
import { calculate } from '@/lib/engine';
import { admitCaller } from '@/lib/http/admit-caller';
import { defineHandler } from '@/lib/http/define-handler';
import { readJsonBody } from '@/lib/http/json';
import { errorResponse, expectedError } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_BODY_BYTES = 64 * 1024;

/** The answer to an admitted caller, with the rate-limit headers on every outcome; the service sized, if any. */
async function answer(
  req: Request,
  headers: Record<string, string>,
): Promise<{ response: Response; service?: string }> {
  try {
    const result = calculate(await readJsonBody(req, MAX_BODY_BYTES));
    return {
      response: Response.json(result, { headers: { 'Cache-Control': 'no-store', ...headers } }),
      service: result.service,
    };
  } catch (err) {
    // The engine's refusal (SizingInputError) is the 400 with every field; anything else goes to defineHandler.
    const known = expectedError(err);
    if (!known) throw err;
    return { response: errorResponse(known, {}, headers) };
  }
}

/**
 * Public sizing endpoint: 200 with the result, 400 with every refused field, 401 for an invalid API key, 413 above
 * 64 KiB, 429 past the caller's limit (per API key, per signed-in user, or per address for anonymous callers).
 */
export const POST = defineHandler(
  async (req) => {
    const admitted = await admitCaller(req);
    if (!admitted.ok) return admitted.response;
    const { response, service } = await answer(req, admitted.headers);
    // A keyed request is counted for its day and attributed to its account in the audit trail.
    if (admitted.caller.kind === 'api-key')
      await recordKeyUse(admitted.caller.key, { status: response.status, service });
    return response;
  },
  {
    name: 'engine.calculate',
    failure: 'The calculation failed on our side; nothing is wrong with the request format.',
  },
);

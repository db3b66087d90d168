import { calculate } from '@/lib/engine';
import { defineHandler } from '@/lib/http/define-handler';
import { readJsonBody } from '@/lib/http/json';
import { limitRequest } from '@/lib/ratelimit/guard-request';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_BODY_BYTES = 64 * 1024;

/** Public sizing endpoint: 200 with the result, 400 with every refused field, 413 above 64 KiB, 429 over the rate limit. */
export const POST = defineHandler(
  async (req) => {
    const limited = await limitRequest(req, 'calculate');
    if (limited) return limited;
    const body = await readJsonBody(req, MAX_BODY_BYTES);
    // The engine's refusal (SizingInputError) becomes the 400 with every field in defineHandler.
    return Response.json(calculate(body), { headers: { 'Cache-Control': 'no-store' } });
  },
  {
    name: 'engine.calculate',
    failure: 'The calculation failed on our side; nothing is wrong with the request format.',
  },
);

import { calculateOpenApiDocument } from '@/lib/engine/openapi';

export const runtime = 'nodejs';

/** The OpenAPI 3.1 document of the public calculate endpoint. */
export function GET(): Response {
  return Response.json(calculateOpenApiDocument(), { headers: { 'Cache-Control': 'public, max-age=300' } });
}

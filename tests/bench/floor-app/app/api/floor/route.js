// The least a JSON API route can do with the calculate request: read its JSON body and answer a small
// JSON document. No validation, no calculation, no rate limit, no headers of our own.
export const dynamic = 'force-dynamic';

export async function POST(req) {
  const body = await req.json();
  return Response.json({ received: typeof body === 'object' });
}

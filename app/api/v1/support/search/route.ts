import { requireUser } from '@/lib/auth/guards';
import { guarded } from '@/lib/http/guarded';
import { zodErrors } from '@/lib/http/json';
import { auditLookup } from '@/lib/support/audit-lookup';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Support look-up: the search behind /support, audited on every call. */
export const GET = guarded(async (req) => {
  const user = await requireUser('sizing:lookup');
  const parsed = supportSearchSchema.safeParse(Object.fromEntries(new URL(req.url).searchParams));
  if (!parsed.success) return Response.json({ errors: zodErrors(parsed.error) }, { status: 400 });
  const results = await searchSizings(user, parsed.data);
  await auditLookup(user, 'support.searched', 'search', 'sizings', { query: parsed.data, total: results.total });
  return Response.json(results, { headers: { 'Cache-Control': 'no-store' } });
});

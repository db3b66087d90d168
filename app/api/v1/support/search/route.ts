import { requireUser } from '@/lib/auth/guards';
import { parseOrThrow } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { auditLookup } from '@/lib/support/audit-lookup';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Support look-up: the search behind /support, audited on every call. */
export const GET = defineHandler(
  async (req) => {
    const user = await requireUser('sizing:lookup');
    const query = parseOrThrow(supportSearchSchema, Object.fromEntries(new URL(req.url).searchParams));
    const results = await searchSizings(user, query);
    await auditLookup(user, 'support.searched', 'search', 'sizings', { query: query, total: results.total });
    return Response.json(results, { headers: { 'Cache-Control': 'no-store' } });
  },
  { name: 'support.search_sizings' },
);

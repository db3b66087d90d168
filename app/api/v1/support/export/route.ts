import { requireUser } from '@/lib/auth/guards';
import { parseOrThrow } from '@/lib/errors';
import { defineHandler } from '@/lib/http/define-handler';
import { auditLookup } from '@/lib/support/audit-lookup';
import { exportLookupCsv } from '@/lib/support/export';
import { supportSearchSchema } from '@/lib/support/schema';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** The current look-up as CSV (up to 5,000 rows), with formula-looking cells neutralised. */
export const GET = defineHandler(
  async (req) => {
    const user = await requireUser('sizing:lookup');
    const query = parseOrThrow(supportSearchSchema, {
      ...Object.fromEntries(new URL(req.url).searchParams),
      page: 1,
      pageSize: 100,
    });
    const { csv, rows } = await exportLookupCsv(user, query);
    await auditLookup(user, 'support.exported', 'search', 'sizings', { query: query, rows });
    return new Response(csv, {
      headers: {
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': 'attachment; filename="dutywise-lookup.csv"',
        'Cache-Control': 'no-store',
      },
    });
  },
  { name: 'support.export_lookup' },
);

import { requireUser } from '@/lib/auth/guards';
import { guarded } from '@/lib/http/guarded';
import { zodErrors } from '@/lib/http/json';
import { auditLookup } from '@/lib/support/audit-lookup';
import { exportLookupCsv } from '@/lib/support/export';
import { supportSearchSchema } from '@/lib/support/schema';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** The current look-up as CSV (up to 5,000 rows), with formula-looking cells neutralised. */
export const GET = guarded(async (req) => {
  const user = await requireUser('sizing:lookup');
  const parsed = supportSearchSchema.safeParse({
    ...Object.fromEntries(new URL(req.url).searchParams),
    page: 1,
    pageSize: 100,
  });
  if (!parsed.success) return Response.json({ errors: zodErrors(parsed.error) }, { status: 400 });
  const { csv, rows } = await exportLookupCsv(user, parsed.data);
  await auditLookup(user, 'support.exported', 'search', 'sizings', { query: parsed.data, rows });
  return new Response(csv, {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': 'attachment; filename="dutywise-lookup.csv"',
      'Cache-Control': 'no-store',
    },
  });
});

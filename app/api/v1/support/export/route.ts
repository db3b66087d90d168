import { requireUser } from '@/lib/auth/guards';
import { toCsv } from '@/lib/csv/write';
import { guarded } from '@/lib/http/guarded';
import { zodErrors } from '@/lib/http/json';
import { auditLookup } from '@/lib/support/audit-lookup';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const MAX_ROWS = 5_000;

/** The current look-up as CSV (up to 5,000 rows), with formula-looking cells neutralised. */
export const GET = guarded(async (req) => {
  const user = await requireUser('support:search');
  const parsed = supportSearchSchema.safeParse({
    ...Object.fromEntries(new URL(req.url).searchParams),
    page: 1,
    pageSize: 100,
  });
  if (!parsed.success) return Response.json({ errors: zodErrors(parsed.error) }, { status: 400 });
  const rows: unknown[][] = [];
  for (let page = 1; rows.length < MAX_ROWS; page++) {
    const res = await searchSizings(user, { ...parsed.data, page, pageSize: 100 });
    for (const h of res.hits)
      rows.push([
        h.number,
        h.createdAt,
        h.accountName,
        h.title,
        h.equipmentTag,
        h.service,
        h.gasLabel,
        Number(h.headlineKw.toFixed(3)),
        h.datasheetNumber,
        h.quoteNumbers.join(' '),
        h.createdByName,
      ]);
    if (res.hits.length < 100) break;
  }
  await auditLookup(user, 'support.exported', 'search', 'sizings', { query: parsed.data, rows: rows.length });
  const csv = toCsv(
    [
      'sizing',
      'created_utc',
      'customer',
      'title',
      'equipment_tag',
      'service',
      'gas',
      'headline_kw',
      'datasheet',
      'quotes',
      'created_by',
    ],
    rows,
  );
  return new Response(csv, {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': 'attachment; filename="dutywise-lookup.csv"',
      'Cache-Control': 'no-store',
    },
  });
});

import { checkReadiness } from '@/lib/ops/readiness';
import { viewerIsStaff } from '@/lib/ops/viewer';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Load-balancer readiness: database reachable and outgoing mail not stuck; the details for signed-in staff only. */
export async function GET() {
  const report = await checkReadiness().catch(() => null);
  const ready = report?.ready ?? false;
  const body = report && (await viewerIsStaff()) ? report : { ready };
  return Response.json(body, { status: ready ? 200 : 503, headers: { 'Cache-Control': 'no-store' } });
}

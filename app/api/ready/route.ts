import { checkReadiness } from '@/lib/ops/readiness';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Load-balancer readiness: database reachable and outgoing mail not stuck. */
export async function GET() {
  const report = await checkReadiness().catch(() => null);
  if (!report) return Response.json({ ready: false, message: 'readiness check failed' }, { status: 503 });
  return Response.json(report, { status: report.ready ? 200 : 503, headers: { 'Cache-Control': 'no-store' } });
}

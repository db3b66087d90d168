import { logger } from '@/lib/log/logger';
import { checkHealth } from '@/lib/ops/health';
import { viewerIsStaff } from '@/lib/ops/viewer';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Liveness with a database check: 200 up or 503 down for everyone; the details for signed-in staff only. */
export async function GET() {
  const report = await checkHealth();
  const up = report.status === 'ok';
  if (!up) logger.warn({ database: report.database }, 'health check: database down');
  const body = (await viewerIsStaff()) ? report : { status: up ? 'up' : 'down' };
  return Response.json(body, { status: up ? 200 : 503, headers: { 'Cache-Control': 'no-store' } });
}

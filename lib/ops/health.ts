import 'server-only';
import { sql } from 'drizzle-orm';
import { db } from '@/db';

export type HealthReport = {
  status: 'ok' | 'unavailable';
  database: { up: boolean; latencyMs?: number; message?: string };
  checkedAt: string;
};

/** Pings the database with a short deadline so a dead server answers quickly rather than hanging. */
export async function checkHealth(deadlineMs = 2_500): Promise<HealthReport> {
  const started = performance.now();
  const timeout = new Promise<never>((_, reject) =>
    setTimeout(() => reject(new Error(`no answer within ${deadlineMs} ms`)), deadlineMs).unref(),
  );
  try {
    await Promise.race([db.execute(sql`select 1`), timeout]);
    return {
      status: 'ok',
      database: { up: true, latencyMs: Math.round(performance.now() - started) },
      checkedAt: new Date().toISOString(),
    };
  } catch (err) {
    return {
      status: 'unavailable',
      database: { up: false, message: `Database unreachable: ${describeDbError(err)}` },
      checkedAt: new Date().toISOString(),
    };
  }
}

/** A short, operator-readable reason without a stack trace or credentials. */
export function describeDbError(err: unknown): string {
  const e = err as { code?: string; message?: string; cause?: { code?: string; message?: string } };
  const code = e?.code ?? e?.cause?.code;
  if (code === 'ECONNREFUSED') return 'connection refused (is PostgreSQL running?)';
  if (code === '57P01' || code === '57P03') return 'the database server is shutting down or starting up';
  const msg = (e?.cause?.message ?? e?.message ?? 'unknown error').replace(/postgres(ql)?:\/\/[^\s]+/g, '[url]');
  return msg.slice(0, 200);
}

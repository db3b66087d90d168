import 'server-only';
import { outboxBacklog } from '@/lib/email/queries';
import { checkHealth, type HealthReport } from './health';

// Mail older than this in the queue means delivery is stuck (SMTP down or no worker running).
const STUCK_AFTER_S = 15 * 60;

export type Readiness = HealthReport & {
  outbox: { pending: number; dead: number; oldestPendingAgeS: number | null; stuck: boolean } | null;
  ready: boolean;
};

/** Ready to take traffic: the database answers and the mail queue is not stuck. */
export async function checkReadiness(): Promise<Readiness> {
  const health = await checkHealth();
  if (!health.database.up) return { ...health, outbox: null, ready: false };
  const backlog = await outboxBacklog();
  const stuck = (backlog.oldestPendingAgeS ?? 0) > STUCK_AFTER_S;
  return { ...health, outbox: { ...backlog, stuck }, ready: !stuck };
}

import 'server-only';
import { logger } from '@/lib/log/logger';
import { drainOutbox } from './drain';

let inFlight: Promise<unknown> | null = null;

/**
 * Sends freshly queued mail now instead of at the worker's next pass. Call after the transaction
 * that queued it commits. Fire-and-forget: never throws, and the worker picks up whatever this misses.
 */
export function kickOutbox(limit = 5): void {
  // One kick at a time per process; SKIP LOCKED already keeps kicks and workers from double-sending.
  if (inFlight) return;
  inFlight = drainOutbox({ limit, workerId: `kick-${process.pid}` })
    .catch((error: unknown) =>
      logger.warn(
        { component: 'outbox', err: error instanceof Error ? error.message : String(error) },
        'outbox kick failed',
      ),
    )
    .finally(() => {
      inFlight = null;
    });
}

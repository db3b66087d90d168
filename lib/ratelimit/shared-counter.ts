import 'server-only';
import { sql } from 'drizzle-orm';
import { db } from '@/db';

// Limits up to EXACT_UP_TO a minute are counted in PostgreSQL on every request, so they hold exactly across
// instances. Higher limits would serialise every request on one counter row, so each instance counts locally
// and folds its count into the shared row at most every SYNC_MS, or at once near the limit: such a limit
// holds across instances to within one sync interval's traffic. An address already over its limit is
// refused locally until its window ends, so a flood costs no database writes.
const SYNC_MS = 200;
const EXACT_UP_TO = 1000;
const MAX_SLOTS = 20_000;

type Slot = {
  global: number;
  pending: number;
  windowEndsMs: number;
  lastSyncMs: number;
  inFlight: Promise<void> | null;
};
const slots = new Map<string, Slot>();

async function sync(key: string, slot: Slot, windowS: number): Promise<void> {
  const delta = slot.pending;
  slot.pending = 0;
  slot.lastSyncMs = Date.now();
  const res = await db.execute<{ count: number; age_s: number }>(sql`
    insert into rate_limits as r (key, window_start, count) values (${key}, now(), ${delta})
    on conflict (key) do update set
      count = case when r.window_start <= now() - make_interval(secs => ${windowS}) then ${delta} else r.count + ${delta} end,
      window_start = case when r.window_start <= now() - make_interval(secs => ${windowS}) then now() else r.window_start end
    returning count, extract(epoch from now() - window_start)::float8 as age_s`);
  const row = res.rows[0];
  if (row) {
    slot.global = row.count;
    slot.windowEndsMs = Date.now() + Math.max(0, windowS - row.age_s) * 1000;
  }
}

function evictExpired(now: number) {
  if (slots.size < MAX_SLOTS) return;
  for (const [k, s] of slots) if (s.windowEndsMs < now && !s.inFlight) slots.delete(k);
}

export type SharedDecision = { allowed: boolean; retryAfterS: number; remaining: number; resetS: number };

/**
 * Counts one request against `key`; resolves to whether it is within `limit` per `windowS`, when to retry, what
 * is left of the window and when it ends.
 */
export async function consumeShared(key: string, limit: number, windowS: number): Promise<SharedDecision> {
  const now = Date.now();
  evictExpired(now);
  let slot = slots.get(key);
  if (!slot) {
    slot = { global: 0, pending: 0, windowEndsMs: 0, lastSyncMs: 0, inFlight: null };
    slots.set(key, slot);
  }
  const untilEndS = () => Math.max(1, Math.ceil((slot.windowEndsMs - Date.now()) / 1000));
  if (now >= slot.windowEndsMs) slot.global = 0;
  else if (slot.global >= limit) return { allowed: false, retryAfterS: untilEndS(), remaining: 0, resetS: untilEndS() };
  slot.pending += 1;
  const nearLimit = limit <= EXACT_UP_TO || slot.global + slot.pending >= limit * 0.9;
  if (nearLimit || now - slot.lastSyncMs >= SYNC_MS) {
    const s = slot;
    s.inFlight ??= sync(key, s, windowS).finally(() => (s.inFlight = null));
    // Near the limit the answer must be exact, so wait; otherwise the sync runs in the background.
    if (nearLimit) await s.inFlight;
    else s.inFlight.catch(() => undefined);
  }
  const total = slot.global + slot.pending;
  const resetS = slot.windowEndsMs > Date.now() ? untilEndS() : windowS;
  return total <= limit
    ? { allowed: true, retryAfterS: 0, remaining: limit - total, resetS }
    : { allowed: false, retryAfterS: resetS, remaining: 0, resetS };
}

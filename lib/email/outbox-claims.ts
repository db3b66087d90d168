import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';

// How long a claim holds a row; a worker that dies mid-send frees it when this runs out.
export const LOCK_SECONDS = 60;
// 12 attempts with the backoff below span about 2.5 hours of outage before a mail is given up.
export const MAX_ATTEMPTS = 12;
const FIRST_RETRY_S = 15;
const MAX_RETRY_S = 30 * 60;

/** Seconds to wait after the given (1-based) failed attempt: 15 s doubling, capped at 30 min. */
export function retryDelaySeconds(attempts: number): number {
  return Math.min(FIRST_RETRY_S * 2 ** Math.max(0, attempts - 1), MAX_RETRY_S);
}

export type ClaimedEmail = {
  id: string;
  template: string;
  toAddress: string;
  subject: string;
  payload: unknown;
  attempts: number;
};

/** The clock the queue runs on: the database's, unless a caller (a test) supplies one. */
export function clock(now: Date | undefined): SQL {
  return sql`coalesce(${now ? now.toISOString() : null}::timestamptz, now())`;
}

/**
 * Claims up to `limit` due rows in one short statement. SKIP LOCKED lets concurrent workers
 * (several app instances) take disjoint rows; the claim itself is the lock, held in the row
 * (locked_until) rather than in an open transaction, so sending happens with no transaction open.
 */
export async function claimDue(limit: number, now: Date | undefined, toAddressLike?: string): Promise<ClaimedEmail[]> {
  const at = clock(now);
  const scope = toAddressLike ? sql`and to_address like ${toAddressLike}` : sql``;
  const res = await db.execute<{
    id: string;
    template: string;
    to_address: string;
    subject: string;
    payload: unknown;
    attempts: number;
  }>(sql`
    with due as (
      select id from outbox
      where status = 'pending' and next_attempt_at <= ${at}
        and (locked_until is null or locked_until <= ${at})
        and attempts < ${MAX_ATTEMPTS} ${scope}
      order by next_attempt_at
      limit ${limit}
      for update skip locked
    )
    update outbox o set attempts = o.attempts + 1, locked_until = ${at} + make_interval(secs => ${LOCK_SECONDS})
    from due where o.id = due.id
    returning o.id, o.template, o.to_address, o.subject, o.payload, o.attempts`);
  return res.rows.map((r) => ({
    id: r.id,
    template: r.template,
    toAddress: r.to_address,
    subject: r.subject,
    payload: r.payload,
    attempts: r.attempts,
  }));
}

/** Rows whose last allowed attempt was claimed by a worker that never reported back are given up. */
export async function buryAbandoned(now: Date | undefined, toAddressLike?: string): Promise<number> {
  const at = clock(now);
  const scope = toAddressLike ? sql`and to_address like ${toAddressLike}` : sql``;
  const res = await db.execute(sql`
    update outbox set status = 'dead', locked_until = null,
      last_error = concat_ws(' | ', last_error, 'no result from the last allowed attempt (worker stopped mid-send)')
    where status = 'pending' and attempts >= ${MAX_ATTEMPTS} and locked_until <= ${at} ${scope}`);
  return res.rowCount ?? 0;
}

export async function markSent(id: string, messageId: string, now: Date | undefined): Promise<void> {
  const at = clock(now);
  // Sent wins over anything a slower, stale claim might write later: the guard below keeps it.
  await db.execute(
    sql`update outbox set status = 'sent', message_id = ${messageId}, sent_at = ${at}, locked_until = null where id = ${id} and status <> 'sent'`,
  );
}

/**
 * Records a failed attempt: retry after the backoff, or dead when attempts are used up or the
 * failure is permanent. Only the claim that made this attempt may write (same attempts count).
 */
export async function markFailed(
  row: ClaimedEmail,
  error: string,
  permanent: boolean,
  now: Date | undefined,
): Promise<'retry' | 'dead'> {
  const at = clock(now);
  const dead = permanent || row.attempts >= MAX_ATTEMPTS;
  await db.execute(sql`
    update outbox set status = ${dead ? 'dead' : 'pending'}::outbox_status, locked_until = null, last_error = ${error.slice(0, 2000)},
      next_attempt_at = ${at} + make_interval(secs => ${retryDelaySeconds(row.attempts)})
    where id = ${row.id} and status = 'pending' and attempts = ${row.attempts}`);
  return dead ? 'dead' : 'retry';
}

/** Hands back claimed rows that were not tried, without counting an attempt against them. */
export async function releaseUntried(rows: readonly ClaimedEmail[]): Promise<void> {
  for (const row of rows) {
    await db.execute(
      sql`update outbox set locked_until = null, attempts = attempts - 1 where id = ${row.id} and status = 'pending' and attempts = ${row.attempts}`,
    );
  }
}

import 'server-only';
import { and, desc, eq, inArray, or, sql } from 'drizzle-orm';
import { db } from '@/db';
import { outbox } from '@/db/schema';
import { env } from '@/lib/env';
import { MAIL_QUEUE } from '@/lib/jobs/queues';

export type EmailLogEntry = {
  id: string;
  to: string;
  subject: string;
  status: 'pending' | 'sent' | 'dead';
  attempts: number;
  createdAt: Date;
  sentAt: Date | null;
  nextAttemptAt: Date | null;
  lastError: string | null;
};

/**
 * The mail sent about one thing (a quote, a datasheet, an invitation), newest first, for the support
 * look-up. Callers authorise first: this reads across accounts.
 */
export async function listEmailsFor(entityType: string, entityId: string): Promise<EmailLogEntry[]> {
  return listEmailsForAny([{ type: entityType, ids: [entityId] }]);
}

/** The mail sent about any of several things (a datasheet and each of its revisions), newest first. */
export async function listEmailsForAny(entities: { type: string; ids: string[] }[]): Promise<EmailLogEntry[]> {
  const match = or(
    ...entities
      .filter((e) => e.ids.length)
      .map((e) => and(eq(outbox.entityType, e.type), inArray(outbox.entityId, e.ids))),
  );
  if (!match) return [];
  const rows = await db
    .select({
      id: outbox.id,
      to: outbox.toAddress,
      subject: outbox.subject,
      status: outbox.status,
      attempts: outbox.attempts,
      createdAt: outbox.createdAt,
      sentAt: outbox.sentAt,
      // The delivery job (same id as the row) knows when pg-boss will try again.
      nextAttemptAt: sql<Date | null>`(select j.start_after from ${sql.identifier(env.JOBS_SCHEMA)}.job j
        where j.name = ${MAIL_QUEUE} and j.id = "outbox"."id" and j.state in ('created', 'retry'))`.mapWith(
        (v: string | Date | null) => (v === null ? null : new Date(v)),
      ),
      lastError: outbox.lastError,
    })
    .from(outbox)
    .where(match)
    .orderBy(desc(outbox.createdAt))
    .limit(100);
  // A retry time means something only while the mail is still waiting.
  return rows.map((r) => ({ ...r, nextAttemptAt: r.status === 'pending' ? r.nextAttemptAt : null }));
}

export type OutboxBacklog = { pending: number; dead: number; oldestPendingAgeS: number | null };

/** Queue health for the readiness check: how much mail waits, how long the oldest has waited, how much was given up. */
export async function outboxBacklog(): Promise<OutboxBacklog> {
  const res = await db.execute<{ pending: string; dead: string; oldest_age_s: string | null }>(sql`
    select count(*) filter (where status = 'pending') as pending,
           count(*) filter (where status = 'dead') as dead,
           extract(epoch from now() - min(created_at) filter (where status = 'pending')) as oldest_age_s
    from outbox where status <> 'sent'`);
  const row = res.rows[0];
  return {
    pending: Number(row?.pending ?? 0),
    dead: Number(row?.dead ?? 0),
    oldestPendingAgeS: row?.oldest_age_s == null ? null : Math.max(0, Math.round(Number(row.oldest_age_s))),
  };
}

import 'server-only';
import { sql } from 'drizzle-orm';
import { db } from '@/db';
import { env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { emailTemplates, type EmailTemplate } from './catalogue';
import { EmailInputError } from './props-schema';
import { renderEmail } from './render';
import { getTransport, messageIdFor } from './transport';

export type DeliveryOutcome = 'sent' | 'dead' | 'skipped';
/** Which attempt this is (1-based) and whether the queue allows another after it. */
export type Attempt = { number: number; last: boolean };

type Claimed = { id: string; template: string; to_address: string; subject: string; payload: unknown };

const log = logger.child({ component: 'mail' });

function describe(error: unknown): string {
  if (!(error instanceof Error)) return String(error);
  const { code, responseCode } = error as Error & { code?: string; responseCode?: number };
  return [code, responseCode, error.message].filter((p) => p !== undefined && p !== '').join(' ');
}

/** Counts the attempt on the mail's row and loads it; null when it was sent or given up already. */
async function startAttempt(outboxId: string): Promise<Claimed | null> {
  const res = await db.execute<Claimed>(sql`
    update outbox set attempts = attempts + 1 where id = ${outboxId} and status = 'pending'
    returning id, template, to_address, subject, payload`);
  return res.rows[0] ?? null;
}

async function recordFailure(outboxId: string, error: string, dead: boolean): Promise<void> {
  await db.execute(sql`
    update outbox set status = ${dead ? 'dead' : 'pending'}::outbox_status, last_error = ${error.slice(0, 2000)}
    where id = ${outboxId} and status = 'pending'`);
}

async function render(row: Claimed) {
  if (!(emailTemplates as readonly string[]).includes(row.template))
    throw new EmailInputError(`template: unknown e-mail template "${row.template}"`);
  return renderEmail(row.template as EmailTemplate, row.payload);
}

/**
 * One attempt at one queued mail: render, send, record. A payload that can never render is given up at
 * once; a failed send is recorded and thrown, so the queue retries it with back-off (or, after the last
 * attempt, dead-letters it). The Message-ID comes from the row, so a resend after a crash is the same mail.
 */
export async function deliverEmail(outboxId: string, attempt: Attempt): Promise<DeliveryOutcome> {
  const row = await startAttempt(outboxId);
  if (!row) return 'skipped';
  let rendered: Awaited<ReturnType<typeof render>>;
  try {
    rendered = await render(row);
  } catch (error) {
    const permanent = error instanceof EmailInputError;
    await recordFailure(row.id, `render: ${describe(error)}`, permanent || attempt.last);
    log.error({ outboxId: row.id, err: describe(error) }, 'e-mail could not be rendered');
    if (permanent) return 'dead';
    throw error;
  }
  const messageId = messageIdFor(row.id);
  try {
    const info = await getTransport().sendMail({
      from: env.MAIL_FROM,
      to: row.to_address,
      subject: row.subject,
      html: rendered.html,
      text: rendered.text,
      messageId,
    });
    // If this write fails the job expires and the mail goes again under the same Message-ID.
    await db.execute(sql`
      update outbox set status = 'sent', message_id = ${info.messageId || messageId}, sent_at = now()
      where id = ${row.id} and status <> 'sent'`);
    return 'sent';
  } catch (error) {
    await recordFailure(row.id, describe(error), attempt.last);
    log.warn({ outboxId: row.id, attempt: attempt.number, err: describe(error) }, 'e-mail not sent');
    throw error;
  }
}

/** A mail whose last attempt failed or never reported back (dead-lettered): recorded as given up. */
export async function buryEmail(outboxId: string): Promise<DeliveryOutcome> {
  const res = await db.execute(sql`
    update outbox set status = 'dead',
      last_error = concat_ws(' | ', last_error, 'no result from the last allowed attempt (worker stopped mid-send)')
    where id = ${outboxId} and status = 'pending'`);
  return (res.rowCount ?? 0) > 0 ? 'dead' : 'skipped';
}

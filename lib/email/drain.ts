import 'server-only';
import { hostname } from 'node:os';
import { env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { emailTemplates, type EmailTemplate } from './catalogue';
import {
  claimDue,
  buryAbandoned,
  LOCK_SECONDS,
  markFailed,
  markSent,
  releaseUntried,
  type ClaimedEmail,
} from './outbox-claims';
import { EmailInputError } from './props-schema';
import { renderEmail, type RenderedEmail } from './render';
import { getTransport, messageIdFor } from './transport';

export type DrainOptions = {
  /** Most rows claimed in this pass. */
  limit?: number;
  /** Names the caller in logs (one per process or instance). */
  workerId?: string;
  /** Clock override for retry schedules in tests; the database clock otherwise. */
  now?: Date;
  /** Only recipients matching this SQL LIKE pattern; lets test files share one database without sending each other's mail. */
  toAddressLike?: string;
};

export type DrainResult = { claimed: number; sent: number; retried: number; dead: number; released: number };

// Errors with no SMTP reply code (refused, timed out, reset) or a 421 mean the server, not this
// message, is the problem: the rest of the batch would fail the same way, slowly.
function serverUnavailable(error: unknown): boolean {
  if (typeof error !== 'object' || error === null) return false;
  const { responseCode, code } = error as { responseCode?: number; code?: string };
  return responseCode === undefined || responseCode === 421 || code === 'EAUTH';
}

function describe(error: unknown): string {
  if (!(error instanceof Error)) return String(error);
  const { code, responseCode } = error as Error & { code?: string; responseCode?: number };
  return [code, responseCode, error.message].filter((p) => p !== undefined && p !== '').join(' ');
}

async function renderRow(row: ClaimedEmail) {
  if (!(emailTemplates as readonly string[]).includes(row.template))
    throw new EmailInputError(`template: unknown e-mail template "${row.template}"`);
  return renderEmail(row.template as EmailTemplate, row.payload);
}

async function sendRow(row: ClaimedEmail, rendered: RenderedEmail): Promise<string> {
  const messageId = messageIdFor(row.id);
  // The Message-ID comes from the row, so a resend after a crash is the same message to the receiver.
  const info = await getTransport().sendMail({
    from: env.MAIL_FROM,
    to: row.toAddress,
    subject: row.subject,
    html: rendered.html,
    text: rendered.text,
    messageId,
  });
  return info.messageId || messageId;
}

/**
 * Claims due outbox rows, sends each outside any transaction and records the outcome: sent,
 * retry with backoff, or dead. Safe to run from several processes at once.
 */
export async function drainOutbox(options: DrainOptions = {}): Promise<DrainResult> {
  const { limit = 20, workerId = `${hostname()}-${process.pid}`, now, toAddressLike } = options;
  const log = logger.child({ component: 'outbox', workerId });
  const result: DrainResult = { claimed: 0, sent: 0, retried: 0, dead: 0, released: 0 };
  result.dead += await buryAbandoned(now, toAddressLike);
  const rows = await claimDue(limit, now, toAddressLike);
  result.claimed = rows.length;
  const claimedAt = Date.now();
  let outage: string | null = null;

  for (const [index, row] of rows.entries()) {
    // Stop before the claim runs out, so another worker never picks up a row this one is still sending.
    if (Date.now() - claimedAt > LOCK_SECONDS * 750) {
      const rest = rows.slice(index);
      await releaseUntried(rest);
      result.released += rest.length;
      break;
    }
    if (outage) {
      const outcome = await markFailed(row, `not tried, SMTP unavailable: ${outage}`, false, now);
      result[outcome === 'dead' ? 'dead' : 'retried'] += 1;
      continue;
    }
    let rendered: RenderedEmail;
    try {
      rendered = await renderRow(row);
    } catch (error) {
      // A payload that fails validation never will pass: give it up now rather than after 12 tries.
      const outcome = await markFailed(row, `render: ${describe(error)}`, error instanceof EmailInputError, now);
      result[outcome === 'dead' ? 'dead' : 'retried'] += 1;
      log.error({ outboxId: row.id, outcome, err: describe(error) }, 'e-mail could not be rendered');
      continue;
    }
    let messageId: string;
    try {
      messageId = await sendRow(row, rendered);
    } catch (error) {
      const outcome = await markFailed(row, describe(error), false, now);
      result[outcome === 'dead' ? 'dead' : 'retried'] += 1;
      log.warn({ outboxId: row.id, attempts: row.attempts, outcome, err: describe(error) }, 'e-mail not sent');
      if (serverUnavailable(error)) outage = describe(error);
      continue;
    }
    // If this write fails the claim simply expires and the mail goes again under the same Message-ID.
    await markSent(row.id, messageId, now);
    result.sent += 1;
  }
  if (result.claimed > 0 || result.dead > 0) log.info(result, 'outbox drained');
  return result;
}

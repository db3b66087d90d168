import 'server-only';
import type { Tx } from '@/db';
import { outbox } from '@/db/schema';
import { sendJob } from '@/lib/jobs/boss';
import { MAIL_QUEUE } from '@/lib/jobs/queues';
import { logger } from '@/lib/log/logger';
import { subjectFor, type EmailProps, type EmailTemplate } from './catalogue';
import { parseEmailProps, parseRecipient } from './props-schema';

export type EnqueueInput<T extends EmailTemplate> = {
  template: T;
  to: string;
  props: EmailProps[T];
  accountId?: string | null;
  entity?: { type: string; id: string };
  /** Same key twice enqueues once (e.g. one payment-failed mail per invoice). */
  dedupeKey?: string;
};

function problemWith<T extends EmailTemplate>(input: EnqueueInput<T>): string | null {
  try {
    parseRecipient(input.to);
    parseEmailProps(input.template, input.props);
    return null;
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
}

function safeSubject<T extends EmailTemplate>(input: EnqueueInput<T>): string {
  try {
    return subjectFor(input.template, input.props);
  } catch {
    return `(${String(input.template)} e-mail)`;
  }
}

/**
 * Queues a message in the caller's transaction: the outbox row (the mail's record, shown to support) and
 * its job on the mail queue exist exactly when the change that caused them commits. The worker renders
 * and sends it, retrying while SMTP is down.
 *
 * A recipient or props that could never be sent do not fail the caller's change (a webhook or an
 * issue must not roll back over a mistyped address): the row is stored dead, with the field and the
 * reason in last_error, where the support look-up shows it.
 */
export async function enqueueEmail<T extends EmailTemplate>(tx: Tx, input: EnqueueInput<T>): Promise<void> {
  const problem = problemWith(input);
  const [row] = await tx
    .insert(outbox)
    .values({
      template: input.template,
      toAddress: String(input.to).trim(),
      subject: problem ? safeSubject(input) : subjectFor(input.template, parseEmailProps(input.template, input.props)),
      payload: input.props,
      accountId: input.accountId ?? null,
      entityType: input.entity?.type ?? null,
      entityId: input.entity?.id ?? null,
      dedupeKey: input.dedupeKey ?? null,
      ...(problem ? { status: 'dead' as const, lastError: `not sent: ${problem}` } : {}),
    })
    .onConflictDoNothing()
    .returning({ id: outbox.id });
  if (problem) {
    logger.error(
      { component: 'outbox', template: input.template, entity: input.entity, err: problem },
      'e-mail cannot be sent; stored as dead',
    );
    return;
  }
  // A deduplicated mail already has its row and its job.
  if (row) await sendJob(tx, MAIL_QUEUE, { outboxId: row.id }, { id: row.id });
}

import 'server-only';
import type { Tx } from '@/db';
import { outbox } from '@/db/schema';
import { subjectFor, type EmailProps, type EmailTemplate } from './catalogue';

export type EnqueueInput<T extends EmailTemplate> = {
  template: T;
  to: string;
  props: EmailProps[T];
  accountId?: string | null;
  entity?: { type: string; id: string };
  /** Same key twice enqueues once (e.g. one payment-failed mail per invoice). */
  dedupeKey?: string;
};

/**
 * Queues a message in the caller's transaction: the mail exists exactly when the change that caused
 * it commits. The worker renders and sends it, retrying while SMTP is down.
 */
export async function enqueueEmail<T extends EmailTemplate>(tx: Tx, input: EnqueueInput<T>): Promise<void> {
  await tx
    .insert(outbox)
    .values({
      template: input.template,
      toAddress: input.to,
      subject: subjectFor(input.template, input.props),
      payload: input.props,
      accountId: input.accountId ?? null,
      entityType: input.entity?.type ?? null,
      entityId: input.entity?.id ?? null,
      dedupeKey: input.dedupeKey ?? null,
    })
    .onConflictDoNothing();
}

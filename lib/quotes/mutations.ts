import 'server-only';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { accounts, quoteItems, quotes, sizings } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import { enqueueEmail } from '@/lib/email/enqueue';
import { env } from '@/lib/env';
import { AppError } from '@/lib/errors';
import { nextNumber } from '@/lib/numbering/next-number';
import { createInvitation, hasUserWithEmail } from '@/lib/accounts/mutations';
import { lineFigures } from './line-figures';
import { formatMoney, formatPriceTotal, priceCents, priceTotals } from './prices';
import type { QuoteCreateInput } from './schema';

async function lockQuote(tx: Tx, user: CurrentUser, quoteId: string) {
  const [q] = await tx
    .select({
      id: quotes.id,
      accountId: quotes.accountId,
      status: quotes.status,
      number: quotes.number,
      title: quotes.title,
    })
    .from(quotes)
    .where(eq(quotes.id, quoteId))
    .for('update')
    .limit(1);
  if (!q) throw new AppError('not_found', 'That quote does not exist.');
  assertAccountAccess(user, q.accountId);
  return q;
}

/** Sizings must belong to the quote's account: a line can never reach into another customer's work. */
async function assertSizingsInAccount(tx: Tx, accountId: string, sizingIds: string[]) {
  if (!sizingIds.length) return;
  const found = await tx
    .select({ id: sizings.id })
    .from(sizings)
    .where(and(inArray(sizings.id, sizingIds), eq(sizings.accountId, accountId)));
  if (found.length !== new Set(sizingIds).size)
    throw new AppError('unprocessable', 'Every line must be a sizing saved to this quote’s customer account.', [
      { path: 'sizingIds', message: 'Not all sizings belong to this account.' },
    ]);
}

export async function createQuote(
  user: CurrentUser,
  input: QuoteCreateInput,
  txIn?: Tx,
): Promise<{ id: string; number: string }> {
  assertAccountAccess(user, input.accountId);
  const work = async (tx: Tx) => {
    const [acct] = await tx.select({ id: accounts.id }).from(accounts).where(eq(accounts.id, input.accountId)).limit(1);
    if (!acct)
      throw new AppError('not_found', 'That customer account does not exist.', [
        { path: 'accountId', message: 'Unknown account.' },
      ]);
    await assertSizingsInAccount(tx, input.accountId, input.sizingIds);
    const number = await nextNumber(tx, 'quote');
    const [q] = await tx
      .insert(quotes)
      .values({ number, accountId: input.accountId, title: input.title, notes: input.notes, createdByUserId: user.id })
      .returning({ id: quotes.id });
    if (!q) throw new Error('quote insert returned no row');
    if (input.sizingIds.length) {
      await tx
        .insert(quoteItems)
        .values(input.sizingIds.map((sizingId, position) => ({ quoteId: q.id, sizingId, position, quantity: 1 })));
    }
    await writeAudit(tx, {
      actor: user,
      action: 'quote.created',
      entityType: 'quote',
      entityId: q.id,
      accountId: input.accountId,
      detail: { number, lines: input.sizingIds.length },
    });
    return { id: q.id, number };
  };
  return txIn ? work(txIn) : db.transaction(work);
}

export async function addQuoteItem(
  user: CurrentUser,
  quoteId: string,
  sizingId: string,
  quantity: number,
  txIn?: Tx,
): Promise<void> {
  const work = async (tx: Tx) => {
    const q = await lockQuote(tx, user, quoteId);
    if (q.status !== 'draft')
      throw new AppError('conflict', `Quote ${q.number} is ${q.status}; only draft quotes take new lines.`);
    await assertSizingsInAccount(tx, q.accountId, [sizingId]);
    const [{ pos } = { pos: 0 }] = await tx
      .select({ pos: sql<number>`coalesce(max(${quoteItems.position}) + 1, 0)::int` })
      .from(quoteItems)
      .where(eq(quoteItems.quoteId, quoteId));
    await tx
      .insert(quoteItems)
      .values({ quoteId, sizingId, quantity, position: pos })
      .onConflictDoUpdate({ target: [quoteItems.quoteId, quoteItems.sizingId], set: { quantity } });
    await writeAudit(tx, {
      actor: user,
      action: 'quote.line_added',
      entityType: 'quote',
      entityId: quoteId,
      accountId: q.accountId,
      detail: { sizingId, quantity },
    });
  };
  if (txIn) await work(txIn);
  else await db.transaction(work);
}

/** Appends many sizings of the quote's account as lines (batch saves), in the caller's transaction. */
export async function addQuoteItems(tx: Tx, user: CurrentUser, quoteId: string, sizingIds: string[]): Promise<void> {
  const q = await lockQuote(tx, user, quoteId);
  if (q.status !== 'draft')
    throw new AppError('conflict', `Quote ${q.number} is ${q.status}; only draft quotes take new lines.`);
  await assertSizingsInAccount(tx, q.accountId, sizingIds);
  const [{ pos } = { pos: 0 }] = await tx
    .select({ pos: sql<number>`coalesce(max(${quoteItems.position}) + 1, 0)::int` })
    .from(quoteItems)
    .where(eq(quoteItems.quoteId, quoteId));
  for (let i = 0; i < sizingIds.length; i += 1000) {
    await tx
      .insert(quoteItems)
      .values(
        sizingIds.slice(i, i + 1000).map((sizingId, j) => ({ quoteId, sizingId, quantity: 1, position: pos + i + j })),
      )
      .onConflictDoNothing();
  }
  await writeAudit(tx, {
    actor: user,
    action: 'quote.lines_added',
    entityType: 'quote',
    entityId: quoteId,
    accountId: q.accountId,
    detail: { count: sizingIds.length },
  });
}

export async function removeQuoteItem(user: CurrentUser, quoteId: string, itemId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const q = await lockQuote(tx, user, quoteId);
    if (q.status !== 'draft') throw new AppError('conflict', `Quote ${q.number} is ${q.status}; lines are fixed.`);
    const res = await tx
      .delete(quoteItems)
      .where(and(eq(quoteItems.id, itemId), eq(quoteItems.quoteId, quoteId)))
      .returning({ id: quoteItems.id });
    if (!res[0]) throw new AppError('not_found', 'That line is not on this quote.');
    await writeAudit(tx, {
      actor: user,
      action: 'quote.line_removed',
      entityType: 'quote',
      entityId: quoteId,
      accountId: q.accountId,
      detail: { itemId },
    });
  });
}

/** Sets or clears one line's unit price (draft quotes only: a sent quote's prices are what the customer saw). */
export async function setQuoteLinePrice(
  user: CurrentUser,
  input: { quoteId: string; itemId: string; unitPrice: string | null },
): Promise<void> {
  await db.transaction(async (tx) => {
    const q = await lockQuote(tx, user, input.quoteId);
    if (q.status !== 'draft')
      throw new AppError('conflict', `Quote ${q.number} is ${q.status}; prices are fixed once it is sent.`);
    const res = await tx
      .update(quoteItems)
      .set({ unitPrice: input.unitPrice })
      .where(and(eq(quoteItems.id, input.itemId), eq(quoteItems.quoteId, input.quoteId)))
      .returning({ id: quoteItems.id });
    if (!res[0]) throw new AppError('not_found', 'That line is not on this quote.');
    await writeAudit(tx, {
      actor: user,
      action: 'quote.price_set',
      entityType: 'quote',
      entityId: input.quoteId,
      accountId: q.accountId,
      detail: { itemId: input.itemId, unitPrice: input.unitPrice },
    });
  });
}

export async function setQuoteStatus(
  user: CurrentUser,
  quoteId: string,
  status: 'draft' | 'sent' | 'won' | 'lost',
): Promise<void> {
  await db.transaction(async (tx) => {
    const q = await lockQuote(tx, user, quoteId);
    await tx.update(quotes).set({ status, updatedAt: new Date() }).where(eq(quotes.id, quoteId));
    await writeAudit(tx, {
      actor: user,
      action: 'quote.status_changed',
      entityType: 'quote',
      entityId: quoteId,
      accountId: q.accountId,
      detail: { from: q.status, to: status },
    });
  });
}

/**
 * Marks the quote sent and queues the e-mail to the account's billing contact, atomically. A contact who has no
 * Dutywise sign-in yet gets an invitation to join the account in the same e-mail, landing on the quote (without
 * it, "Create an account" would make them a second company).
 */
export async function sendQuote(user: CurrentUser, quoteId: string): Promise<{ to: string; invited: boolean }> {
  return db.transaction(async (tx) => {
    const q = await lockQuote(tx, user, quoteId);
    const [acct] = await tx
      .select({
        name: accounts.name,
        email: accounts.billingContactEmail,
        currency: accounts.currency,
        unitSystem: accounts.unitSystem,
      })
      .from(accounts)
      .where(eq(accounts.id, q.accountId))
      .limit(1);
    if (!acct?.email)
      throw new AppError(
        'unprocessable',
        'The customer account has no billing contact e-mail; add one on the account page first.',
      );
    const lines = await tx
      .select({
        title: sizings.title,
        tag: sizings.equipmentTag,
        service: sizings.service,
        headlineKw: sizings.headlineKw,
        quantity: quoteItems.quantity,
        unitPrice: quoteItems.unitPrice,
        result: sizings.result,
      })
      .from(quoteItems)
      .innerJoin(sizings, eq(sizings.id, quoteItems.sizingId))
      .where(eq(quoteItems.quoteId, quoteId))
      .orderBy(asc(quoteItems.position), asc(quoteItems.createdAt));
    if (!lines.length) throw new AppError('unprocessable', 'Add at least one sizing before sending the quote.');
    await tx
      .update(quotes)
      .set({ status: 'sent', sentAt: new Date(), updatedAt: new Date() })
      .where(eq(quotes.id, quoteId));
    const invited = !(await hasUserWithEmail(tx, acct.email));
    const join = invited
      ? await createInvitation(tx, user, { accountId: q.accountId, email: acct.email }, `/quotes/${quoteId}`)
      : null;
    const totals = priceTotals(lines);
    await enqueueEmail(tx, {
      template: 'quote-sent',
      to: acct.email,
      accountId: q.accountId,
      entity: { type: 'quote', id: quoteId },
      props: {
        accountName: acct.name,
        quoteNumber: q.number,
        quoteTitle: q.title,
        senderName: user.name,
        quoteUrl: `${env.APP_URL}/quotes/${quoteId}`,
        joinUrl: join?.inviteUrl ?? null,
        lines: lines.map((l) => ({
          title: l.title,
          tag: l.tag,
          headline: lineFigures(l.service, l.headlineKw, l.result, acct.unitSystem),
          quantity: l.quantity,
          price: l.unitPrice === null ? null : formatMoney(priceCents(l.unitPrice)! * l.quantity, acct.currency),
        })),
        total: formatPriceTotal(totals, acct.currency),
      },
    });
    await writeAudit(tx, {
      actor: user,
      action: 'quote.sent',
      entityType: 'quote',
      entityId: quoteId,
      accountId: q.accountId,
      detail: { to: acct.email, invited },
    });
    return { to: acct.email, invited };
  });
}

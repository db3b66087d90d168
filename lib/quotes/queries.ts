import 'server-only';
import { and, asc, desc, eq, ilike, ne, or, sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, quoteItems, quotes, sizings, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { accountScope, assertAccountAccess } from '@/lib/auth/guards';
import { isStaff } from '@/lib/auth/roles';
import { AppError } from '@/lib/errors';
import type { QuoteFilter } from './schema';

export type QuoteSummary = {
  id: string;
  number: string;
  title: string;
  status: string;
  accountId: string;
  accountName: string;
  itemCount: number;
  createdAt: Date;
  sentAt: Date | null;
};

/** Customers see a quote once it is sent; drafts, with their internal lines, stay with vendor staff. */
function visibleToCustomer(user: CurrentUser): SQL | undefined {
  return isStaff(user.role) ? undefined : ne(quotes.status, 'draft');
}

export async function listQuotes(user: CurrentUser, filter: QuoteFilter = {}): Promise<QuoteSummary[]> {
  const scope = accountScope(user);
  const conds: SQL[] = [];
  if (scope) conds.push(eq(quotes.accountId, scope));
  const visible = visibleToCustomer(user);
  if (visible) conds.push(visible);
  if (filter.status) conds.push(eq(quotes.status, filter.status));
  if (filter.accountId) conds.push(eq(quotes.accountId, filter.accountId));
  if (filter.q) {
    const like = `%${filter.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;
    const match = or(ilike(quotes.title, like), ilike(quotes.number, like), ilike(accounts.name, like));
    if (match) conds.push(match);
  }
  return db
    .select({
      id: quotes.id,
      number: quotes.number,
      title: quotes.title,
      status: quotes.status,
      accountId: quotes.accountId,
      accountName: accounts.name,
      itemCount: sql<number>`(select count(*)::int from ${quoteItems} qi where qi.quote_id = ${quotes.id})`,
      createdAt: quotes.createdAt,
      sentAt: quotes.sentAt,
    })
    .from(quotes)
    .innerJoin(accounts, eq(accounts.id, quotes.accountId))
    .where(conds.length ? and(...conds) : undefined)
    .orderBy(desc(quotes.createdAt))
    .limit(300);
}

export type QuoteLine = {
  itemId: string;
  sizingId: string;
  sizingNumber: string;
  title: string;
  equipmentTag: string | null;
  service: 'heater' | 'compressor';
  gasLabel: string;
  headlineKw: number;
  quantity: number;
  /** Unit price in the account's currency, exact decimal; null when the line is not priced. */
  unitPrice: string | null;
};

export type QuoteDetail = QuoteSummary & {
  notes: string | null;
  createdByName: string | null;
  billingContactEmail: string | null;
  currency: string;
  lines: QuoteLine[];
};

export async function getQuote(user: CurrentUser, quoteId: string): Promise<QuoteDetail> {
  const [q] = await db
    .select({
      id: quotes.id,
      number: quotes.number,
      title: quotes.title,
      status: quotes.status,
      notes: quotes.notes,
      accountId: quotes.accountId,
      accountName: accounts.name,
      billingContactEmail: accounts.billingContactEmail,
      currency: accounts.currency,
      createdAt: quotes.createdAt,
      sentAt: quotes.sentAt,
      createdByName: users.name,
    })
    .from(quotes)
    .innerJoin(accounts, eq(accounts.id, quotes.accountId))
    .leftJoin(users, eq(users.id, quotes.createdByUserId))
    .where(eq(quotes.id, quoteId))
    .limit(1);
  if (!q || (!isStaff(user.role) && q.status === 'draft')) throw new AppError('not_found', 'Not found');
  assertAccountAccess(user, q.accountId);
  const lines = await db
    .select({
      itemId: quoteItems.id,
      sizingId: sizings.id,
      sizingNumber: sizings.number,
      title: sizings.title,
      equipmentTag: sizings.equipmentTag,
      service: sizings.service,
      gasLabel: sizings.gasLabel,
      headlineKw: sizings.headlineKw,
      quantity: quoteItems.quantity,
      unitPrice: quoteItems.unitPrice,
    })
    .from(quoteItems)
    .innerJoin(sizings, eq(sizings.id, quoteItems.sizingId))
    .where(eq(quoteItems.quoteId, quoteId))
    .orderBy(asc(quoteItems.position), asc(quoteItems.createdAt));
  return { ...q, itemCount: lines.length, lines };
}

/** Draft quotes a sizing can be added to, for the save form. */
export async function listOpenQuotes(user: CurrentUser, accountId?: string) {
  const scope = accountScope(user);
  const conds: SQL[] = [eq(quotes.status, 'draft')];
  if (scope) conds.push(eq(quotes.accountId, scope));
  if (accountId) conds.push(eq(quotes.accountId, accountId));
  return db
    .select({ id: quotes.id, number: quotes.number, title: quotes.title, accountId: quotes.accountId })
    .from(quotes)
    .where(and(...conds))
    .orderBy(desc(quotes.createdAt))
    .limit(200);
}

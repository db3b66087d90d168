import 'server-only';
import { eq } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { accounts, sizings } from '@/db/schema';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import { can } from '@/lib/auth/roles';
import { assertSubscribed } from '@/lib/billing/entitlements';
import { calculate, SizingInputError, type SizingResult } from '@/lib/engine';
import { AppError } from '@/lib/errors';
import { nextNumber, nextNumbers } from '@/lib/numbering/next-number';
import { addQuoteItem } from '@/lib/quotes/mutations';
import { computedColumns, type Computed } from './columns';
import { reviseSizing } from './revise';
import type { SizingMeta } from './schema';

/**
 * Pins the equation of state the engine used into the stored input, so reopening the sizing later sizes it on the
 * same equation even if the automatic choice changes; a stored input without one predates real-gas sizing and
 * was made on ideal gas.
 */
export function withEquationUsed(input: unknown, result: SizingResult): unknown {
  if (typeof input !== 'object' || input === null || 'equationOfState' in input) return input;
  return { ...input, equationOfState: result.basis.equationOfState };
}

/** Runs the engine and stores input and result together; refuses input the engine refuses. */
export function computeForSave(input: unknown): { input: unknown; result: SizingResult } {
  try {
    const result = calculate(input);
    return { input: withEquationUsed(input, result), result };
  } catch (err) {
    if (err instanceof SizingInputError) {
      const issues = err.issues.map((i) => ({ path: i.path ? `input.${i.path}` : 'input', message: i.message }));
      throw new AppError('invalid_input', 'The sizing input is not valid; nothing was saved.', issues);
    }
    throw err;
  }
}

function sizingValues(user: CurrentUser, meta: SizingMeta, computed: Computed, number: string, revision: number) {
  return {
    number,
    accountId: meta.accountId,
    title: meta.title,
    equipmentTag: meta.equipmentTag,
    notes: meta.notes,
    ...computedColumns(computed),
    revision,
    createdByUserId: user.id,
  };
}

export async function insertSizing(tx: Tx, user: CurrentUser, meta: SizingMeta, computed: Computed, revision = 1) {
  const number = await nextNumber(tx, 'sizing');
  const [row] = await tx
    .insert(sizings)
    .values(sizingValues(user, meta, computed, number, revision))
    .returning({ id: sizings.id, number: sizings.number });
  if (!row) throw new Error('sizing insert returned no row');
  return row;
}

/** Many sizings in a few statements (batch saves): numbers in one round trip, rows in chunks. */
export async function insertSizings(tx: Tx, user: CurrentUser, items: { meta: SizingMeta; computed: Computed }[]) {
  const numbers = await nextNumbers(tx, 'sizing', items.length);
  const out: { id: string; number: string }[] = [];
  for (let i = 0; i < items.length; i += 500) {
    const chunk = items.slice(i, i + 500).map((it, j) => sizingValues(user, it.meta, it.computed, numbers[i + j]!, 1));
    out.push(...(await tx.insert(sizings).values(chunk).returning({ id: sizings.id, number: sizings.number })));
  }
  return out;
}

/** Saves a sizing to an account (and optionally a draft quote) in one transaction with its audit entry. */
export async function saveSizing(
  user: CurrentUser,
  meta: SizingMeta,
  rawInput: unknown,
): Promise<{ id: string; number: string; version: number }> {
  assertAccountAccess(user, meta.accountId);
  if (meta.quoteId && !can(user.role, 'quote:manage'))
    throw new AppError('forbidden', 'Only vendor staff add sizings to quotes.');
  await assertSubscribed(user, 'Saving sizings to your account');
  const computed = computeForSave(rawInput);
  return db.transaction(async (tx) => {
    const [acct] = await tx.select({ id: accounts.id }).from(accounts).where(eq(accounts.id, meta.accountId)).limit(1);
    if (!acct)
      throw new AppError('not_found', 'That customer account does not exist.', [
        { path: 'accountId', message: 'Unknown account.' },
      ]);
    if (meta.revisedFromId) {
      const row = await reviseSizing(tx, user, { ...meta, revisedFromId: meta.revisedFromId }, computed);
      if (meta.quoteId) await addQuoteItem(user, meta.quoteId, row.id, 1, tx);
      return row;
    }
    const row = await insertSizing(tx, user, meta, computed);
    if (meta.quoteId) await addQuoteItem(user, meta.quoteId, row.id, 1, tx);
    await writeAudit(tx, {
      actor: user,
      action: 'sizing.created',
      entityType: 'sizing',
      entityId: row.id,
      accountId: meta.accountId,
      detail: { number: row.number, quoteId: meta.quoteId ?? null },
    });
    return { ...row, version: 1 };
  });
}

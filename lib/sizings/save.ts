import 'server-only';
import { eq } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { accounts, sizings } from '@/db/schema';
import { ActionError } from '@/lib/actions/define-action';
import { writeAudit } from '@/lib/audit/write';
import type { CurrentUser } from '@/lib/auth/current-user';
import { assertAccountAccess } from '@/lib/auth/guards';
import { can } from '@/lib/auth/roles';
import { calculate, ENGINE_VERSION, SizingInputError, type SizingResult } from '@/lib/engine';
import { findPreset } from '@/lib/thermo';
import { nextNumber, nextNumbers } from '@/lib/numbering/next-number';
import { addQuoteItem } from '@/lib/quotes/mutations';
import type { SizingMeta } from './schema';

// Gas names for lists and search, in words: the preset's name ("Air (dry)"), or the mixture's main components.
export function gasKeyAndLabel(gas: unknown): { key: string; label: string } {
  const g = (gas ?? {}) as { preset?: unknown; components?: unknown; relativeHumidityPercent?: unknown };
  if (typeof g.preset === 'string') {
    const rh = typeof g.relativeHumidityPercent === 'number' ? `, ${g.relativeHumidityPercent} % RH` : '';
    const name = findPreset(g.preset)?.displayName ?? g.preset.replace(/-/g, ' ');
    return { key: g.preset, label: `${name}${rh}` };
  }
  if (g.components && typeof g.components === 'object') {
    const parts = Object.entries(g.components as Record<string, number>)
      .filter(([, v]) => typeof v === 'number' && v > 0)
      .sort((a, b) => b[1] - a[1])
      .slice(0, 4)
      .map(([k, v]) => `${k} ${(v * 100).toFixed(v < 0.1 ? 1 : 0)} %`);
    return { key: 'mixture', label: `Mixture: ${parts.join(', ')}` };
  }
  return { key: 'unknown', label: 'Not recorded' };
}

/** The engine's answer reduced to the scalar columns that lists, filters and search use. */
export function headlineOf(result: SizingResult): number {
  return result.service === 'heater' ? result.heater.designDutyKw : result.compressor.shaftPowerKw;
}

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
      const fieldErrors: Record<string, string[]> = {};
      for (const i of err.issues) (fieldErrors[`input.${i.path}`] ??= []).push(i.message);
      throw new ActionError('The sizing input is not valid; nothing was saved.', 400, fieldErrors);
    }
    throw err;
  }
}

type Computed = { input: unknown; result: SizingResult };

function sizingValues(user: CurrentUser, meta: SizingMeta, computed: Computed, number: string, revision: number) {
  const gas = gasKeyAndLabel((computed.input as { gas?: unknown }).gas);
  return {
    number,
    accountId: meta.accountId,
    title: meta.title,
    equipmentTag: meta.equipmentTag,
    notes: meta.notes,
    service: computed.result.service,
    gasKey: gas.key,
    gasLabel: gas.label,
    input: computed.input,
    result: computed.result,
    engineVersion: ENGINE_VERSION,
    headlineKw: headlineOf(computed.result),
    massFlowKgPerS: computed.result.massFlowKgPerS,
    revision,
    revisedFromId: meta.revisedFromId,
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
): Promise<{ id: string; number: string }> {
  assertAccountAccess(user, meta.accountId);
  if (meta.quoteId && !can(user.role, 'quote:manage'))
    throw new ActionError('Only vendor staff add sizings to quotes.', 403);
  const computed = computeForSave(rawInput);
  return db.transaction(async (tx) => {
    const [acct] = await tx.select({ id: accounts.id }).from(accounts).where(eq(accounts.id, meta.accountId)).limit(1);
    if (!acct) throw new ActionError('That customer account does not exist.', 404, { accountId: ['Unknown account.'] });
    let revision = 1;
    if (meta.revisedFromId) {
      const [prev] = await tx
        .select({ accountId: sizings.accountId, revision: sizings.revision })
        .from(sizings)
        .where(eq(sizings.id, meta.revisedFromId))
        .limit(1);
      if (!prev || prev.accountId !== meta.accountId)
        throw new ActionError('The sizing being revised belongs to another account.', 422);
      revision = prev.revision + 1;
    }
    const row = await insertSizing(tx, user, meta, computed, revision);
    if (meta.quoteId) await addQuoteItem(user, meta.quoteId, row.id, 1, tx);
    await writeAudit(tx, {
      actor: user,
      action: meta.revisedFromId ? 'sizing.revised' : 'sizing.created',
      entityType: 'sizing',
      entityId: row.id,
      accountId: meta.accountId,
      detail: { number: row.number, quoteId: meta.quoteId ?? null },
    });
    return row;
  });
}

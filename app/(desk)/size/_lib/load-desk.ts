import 'server-only';
import { z } from 'zod';
import type { CurrentUser } from '@/lib/auth/current-user';
import { isAppError } from '@/lib/errors';
import { can } from '@/lib/auth/roles';
import { sizingRequestSchema, type SizingInput } from '@/lib/engine';
import { getSizing } from '@/lib/sizings/queries';
import type { ReopenedSizing } from './account-types';
import { decodeShareParam } from './share-link';

export type DeskStart = { input: SizingInput | null; reopened: ReopenedSizing | null; notices: string[] };

async function fromSaved(user: CurrentUser | null, id: string, revise: boolean): Promise<DeskStart> {
  if (!user) return { input: null, reopened: null, notices: ['Sign in to reopen a saved sizing.'] };
  if (!can(user.role, 'sizing:read') || !z.uuid().safeParse(id).success) {
    return { input: null, reopened: null, notices: ['That saved sizing could not be opened.'] };
  }
  try {
    const s = await getSizing(user, id);
    const parsed = sizingRequestSchema.safeParse(s.input);
    if (!parsed.success)
      return {
        input: null,
        reopened: null,
        notices: [
          `Sizing ${s.number} was saved with inputs this engine no longer accepts; start again from its record.`,
        ],
      };
    const reopened: ReopenedSizing = {
      id: s.id,
      number: s.number,
      title: s.title,
      equipmentTag: s.equipmentTag,
      notes: s.notes,
      accountId: s.accountId,
      accountName: s.accountName,
      revision: s.revision,
      revise,
    };
    // Inputs saved before real-gas sizing carry no equation: they were sized on ideal gas and reopen on it.
    if (parsed.data.equationOfState === undefined) {
      return {
        input: { ...parsed.data, equationOfState: 'ideal-gas' },
        reopened,
        notices: [
          `Sizing ${s.number} was made on ideal-gas properties, before real-gas sizing; it reopens on ideal gas. Choose an equation of state in the gas step to size it on real-gas properties.`,
        ],
      };
    }
    return { input: parsed.data, reopened, notices: [] };
  } catch (err) {
    if (isAppError(err, 'not_found'))
      return { input: null, reopened: null, notices: ['That saved sizing could not be opened.'] };
    throw err;
  }
}

/** What the desk opens with: a saved sizing (revise or duplicate), shared inputs, or nothing. */
export async function loadDeskStart(
  user: CurrentUser | null,
  params: { sizing?: string; revise?: string; i?: string; from?: string },
): Promise<DeskStart> {
  if (params.sizing) {
    const saved = await fromSaved(user, params.sizing, params.revise === '1');
    // Edits to a reopened sizing live in the URL beside its id: a reload keeps them.
    const edited = params.i && saved.reopened ? decodeShareParam(params.i) : null;
    return edited?.ok ? { ...saved, input: edited.input, notices: [] } : saved;
  }
  if (params.i) {
    const decoded = decodeShareParam(params.i);
    // The desk writes its own inputs into the URL (from=desk); only a link from elsewhere is announced.
    if (decoded.ok)
      return {
        input: decoded.input,
        reopened: null,
        notices: params.from === 'desk' ? [] : ['Opened from a shared link.'],
      };
    return { input: null, reopened: null, notices: [`The shared link could not be opened: ${decoded.reason}.`] };
  }
  return { input: null, reopened: null, notices: [] };
}

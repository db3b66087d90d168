'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { saveSizing } from '@/lib/sizings/save';
import { saveSizingSchema } from '@/lib/sizings/schema';
import { setUnitSystem } from '@/lib/users/mutations';
import { unitSystemSchema } from '@/lib/users/schema';

/** Saves the desk's input with its title, tag and notes to an account (and a draft quote); the engine recomputes it. */
export const saveSizingAction = defineAction(
  { permission: 'sizing:save', schema: saveSizingSchema, name: 'sizing.save' },
  async ({ input, ...meta }, user) => {
    const saved = await saveSizing(user, meta, input);
    revalidatePath('/sizings');
    if (meta.quoteId) revalidatePath(`/quotes/${meta.quoteId}`);
    return saved;
  },
);

/** Remembers the signed-in user's unit system for the next visit. */
export const setUnitSystemAction = defineAction(
  { permission: 'sizing:read', schema: unitSystemSchema, name: 'user.set_unit_system' },
  async (input, user) => setUnitSystem(user, input),
);

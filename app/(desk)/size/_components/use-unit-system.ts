'use client';

import { useState, useTransition, type MutableRefObject } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import type { UnitSystem } from '@/lib/units';
import { FIELD_LABELS } from '../_lib/field-paths';
import type { DeskValues } from '../_lib/form-types';
import { switchUnitSystem, type ExactValues } from '../_lib/switch-system';
import { setUnitSystemAction } from '../actions';

/** The desk's unit system: switching converts every field in place and, when signed in, is remembered. */
export function useUnitSystem(
  initial: UnitSystem,
  signedIn: boolean,
  form: UseFormReturn<DeskValues>,
  exact: MutableRefObject<ExactValues>,
) {
  const [system, setSystem] = useState<UnitSystem>(initial);
  const [note, setNote] = useState<string | null>(null);
  const [, start] = useTransition();
  const change = (next: UnitSystem) => {
    if (next === system) return;
    const switched = switchUnitSystem(form.getValues(), next, exact.current);
    exact.current = switched.exact;
    form.reset(switched.values, { keepDefaultValues: true });
    setSystem(next);
    const skipped = switched.skipped.map((p) => FIELD_LABELS[p].toLowerCase());
    setNote(skipped.length ? `Kept in their own units until they hold a valid number: ${skipped.join(', ')}.` : null);
    if (!signedIn) return;
    start(async () => {
      const res = await setUnitSystemAction({ unitSystem: next });
      if (!res.ok) setNote('Switched here, but it could not be saved as your default.');
      else if (!skipped.length) setNote('Saved as your default.');
    });
  };
  return { system, change, note };
}

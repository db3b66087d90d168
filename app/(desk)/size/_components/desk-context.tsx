'use client';

import { createContext, useContext, type MutableRefObject } from 'react';
import type { UnitSystem } from '@/lib/units';
import type { AccountSite } from '../_lib/account-types';
import type { FieldKey } from '../_lib/field-paths';
import type { DeskService } from '../_lib/form-types';
import type { ExactValues } from '../_lib/switch-system';

export type DeskContextValue = {
  system: UnitSystem;
  service: DeskService;
  /** Message per field: the schema's as you type, else the calculator's for the current input. */
  errors: Partial<Record<FieldKey, string>>;
  /** Unrounded values behind converted fields, so switching back returns what was typed. */
  exact: MutableRefObject<ExactValues>;
  accounts: readonly AccountSite[];
  barometricSource: string;
  /** The equation of state the current result used and why; null before a result. */
  equationUsed: { id: string; reason: string } | null;
};

const DeskContext = createContext<DeskContextValue | null>(null);

export const DeskProvider = DeskContext.Provider;

/** The desk's shared state for fields and panels. */
export function useDesk(): DeskContextValue {
  const value = useContext(DeskContext);
  if (!value) throw new Error('useDesk outside the sizing desk');
  return value;
}

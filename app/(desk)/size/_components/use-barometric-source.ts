'use client';

import type { AccountSite } from '../_lib/account-types';
import { barometricPaOf } from '../_lib/flow-context';
import type { DeskValues } from '../_lib/form-types';
import { sitePressureOf } from '../_lib/site-pressure';

/** Where the site barometric pressure on the form comes from, in words. */
export function useBarometricSource(values: DeskValues, accounts: readonly AccountSite[]): string {
  const account = accounts.find((a) => a.id === values.accountId);
  const expected = sitePressureOf(account);
  const edited = Math.abs(barometricPaOf(values) / 1000 - expected.kpa) > 0.0005;
  if (edited) return 'entered for this sizing';
  return account ? `${account.name}: ${expected.source}` : expected.source;
}

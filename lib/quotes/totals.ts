import type { QuoteLine } from './queries';

export type ServiceTotal = { units: number; kw: number };
export type QuoteTotals = { heater: ServiceTotal; compressor: ServiceTotal };

/**
 * Quantity-weighted sums per service: heaters' design duty and compressors' shaft power. Kept apart
 * because one is heat into the gas and the other work on the shaft; both are loads the site's
 * electrical supply has to carry, before any diversity factor.
 */
export function quoteTotals(lines: readonly Pick<QuoteLine, 'service' | 'headlineKw' | 'quantity'>[]): QuoteTotals {
  const totals: QuoteTotals = { heater: { units: 0, kw: 0 }, compressor: { units: 0, kw: 0 } };
  for (const l of lines) {
    const t = totals[l.service];
    t.units += l.quantity;
    t.kw += l.headlineKw * l.quantity;
  }
  return totals;
}

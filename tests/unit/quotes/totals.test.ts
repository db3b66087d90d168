import { describe, expect, it } from 'vitest';
import { quoteTotals } from '@/lib/quotes/totals';

describe('quote totals', () => {
  it('weights each line by its quantity and keeps heater duty apart from compressor shaft power', () => {
    const totals = quoteTotals([
      { service: 'heater', headlineKw: 200, quantity: 2 },
      { service: 'heater', headlineKw: 96.7, quantity: 1 },
      { service: 'compressor', headlineKw: 242, quantity: 3 },
    ]);
    expect(totals.heater).toEqual({ units: 3, kw: 496.7 });
    expect(totals.compressor).toEqual({ units: 3, kw: 726 });
  });

  it('is zero for a quote with no lines', () => {
    expect(quoteTotals([])).toEqual({ heater: { units: 0, kw: 0 }, compressor: { units: 0, kw: 0 } });
  });
});

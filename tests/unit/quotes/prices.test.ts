import { describe, expect, it } from 'vitest';
import { formatMoney, formatPriceTotal, priceCents, priceTotals } from '@/lib/quotes/prices';
import { quoteLinePriceSchema } from '@/lib/quotes/schema';

const ids = { quoteId: '7b0f6c1e-2d3a-4c5b-8e9f-0a1b2c3d4e5f', itemId: '1c2d3e4f-5a6b-4c7d-8e9f-a0b1c2d3e4f5' };

describe('quote prices', () => {
  it('reads decimal prices as whole cents, exactly', () => {
    expect(priceCents('12500')).toBe(1_250_000);
    expect(priceCents('12500.5')).toBe(1_250_050);
    expect(priceCents('0.07')).toBe(7);
    // numeric(14,2) comes back from PostgreSQL with two decimals.
    expect(priceCents('99999999999.99')).toBe(9_999_999_999_999);
    expect(priceCents(null)).toBeNull();
    expect(() => priceCents('1.234')).toThrow(/not a price/);
  });

  it('sums 0.10 + 0.20 as 0.30 (no binary rounding in a total)', () => {
    const t = priceTotals([
      { quantity: 1, unitPrice: '0.10' },
      { quantity: 1, unitPrice: '0.20' },
    ]);
    expect(t.totalCents).toBe(30);
    expect(formatMoney(t.totalCents, 'EUR')).toBe('EUR 0.30');
  });

  it('weights each priced line by its quantity and counts the lines without a price', () => {
    const lines = [
      { quantity: 2, unitPrice: '48200.00' },
      { quantity: 3, unitPrice: null },
      { quantity: 1, unitPrice: '1250.50' },
    ];
    expect(priceTotals(lines)).toEqual({ totalCents: 9_765_050, priced: 2, unpriced: 1 });
    expect(formatPriceTotal(priceTotals(lines), 'USD')).toBe('USD 97,650.50 for the 2 priced lines (1 not priced)');
    expect(formatPriceTotal(priceTotals(lines.slice(0, 1)), 'GBP')).toBe('GBP 96,400.00');
    expect(formatPriceTotal(priceTotals([{ quantity: 1, unitPrice: null }]), 'USD')).toBeNull();
  });

  it('accepts a price with thousands separators and clears on an empty entry', () => {
    expect(quoteLinePriceSchema.parse({ ...ids, unitPrice: ' 12,500.50 ' }).unitPrice).toBe('12500.50');
    expect(quoteLinePriceSchema.parse({ ...ids, unitPrice: '' }).unitPrice).toBeNull();
  });

  it.each(['-5', '12.345', 'abc', '1e5', '1234567890123'])('refuses %j as a unit price, naming the field', (bad) => {
    const res = quoteLinePriceSchema.safeParse({ ...ids, unitPrice: bad });
    expect(res.success).toBe(false);
    expect(res.error?.issues[0]?.path).toEqual(['unitPrice']);
    expect(res.error?.issues[0]?.message).toMatch(/up to 2 decimals/);
  });
});

// Quote prices are exact decimals (numeric(14,2) in the database, strings in TypeScript); sums are kept in whole
// cents so no binary rounding creeps into a total.

/** Cents in a decimal string such as "12500" or "12500.5"; null for no price. */
export function priceCents(price: string | null): number | null {
  if (price === null || price === '') return null;
  const m = /^(\d+)(?:\.(\d{1,2}))?$/.exec(price.trim());
  if (!m) throw new Error(`not a price: ${price}`);
  return Number(m[1]) * 100 + Number((m[2] ?? '').padEnd(2, '0'));
}

/** An amount in cents in the account's currency: "USD 12,500.00". */
export function formatMoney(cents: number, currency: string): string {
  const amount = new Intl.NumberFormat('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 }).format(
    cents / 100,
  );
  return `${currency} ${amount}`;
}

export type PriceTotals = { totalCents: number; priced: number; unpriced: number };

/** The quote's price total over its priced lines (quantity × unit price), and how many lines carry no price. */
export function priceTotals(lines: readonly { quantity: number; unitPrice: string | null }[]): PriceTotals {
  let totalCents = 0;
  let priced = 0;
  for (const l of lines) {
    const c = priceCents(l.unitPrice);
    if (c === null) continue;
    totalCents += c * l.quantity;
    priced++;
  }
  return { totalCents, priced, unpriced: lines.length - priced };
}

/** The total as a quote states it: "USD 37,500.00", saying so when some lines carry no price; null if none do. */
export function formatPriceTotal(totals: PriceTotals, currency: string): string | null {
  if (!totals.priced) return null;
  const money = formatMoney(totals.totalCents, currency);
  if (!totals.unpriced) return money;
  return `${money} for the ${totals.priced} priced ${totals.priced === 1 ? 'line' : 'lines'} (${totals.unpriced} not priced)`;
}

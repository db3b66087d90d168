// One rounding rule for figures everywhere (desk, lists, look-up, batch): about four significant figures,
// thousands separators, no exponent for ordinary magnitudes.

const cache = new Map<number, Intl.NumberFormat>();

/** `value` with exactly `decimals` decimals and thousands separators ("1,234.5"); "—" when not finite. */
export function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  let f = cache.get(decimals);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    cache.set(decimals, f);
  }
  const text = f.format(value);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** Decimals that keep about four significant figures for ordinary magnitudes. */
export function decimalsFor(value: number): number {
  const a = Math.abs(value);
  return a >= 1000 ? 0 : a >= 100 ? 1 : a >= 10 ? 2 : 3;
}

/** A figure to about four significant figures ("200.0", "1,547", "0.556"). */
export function figure(value: number): string {
  return fixed(value, decimalsFor(value));
}

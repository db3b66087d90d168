// Dates are shown in UTC with an explicit zone so server-rendered and client-rendered text agree
// and nobody has to guess which clock a quote was sent by.
function pad(n: number): string {
  return String(n).padStart(2, '0');
}

/** 2025-03-07 14:05 UTC */
export function formatDateTime(value: Date | string | null | undefined): string {
  if (!value) return '—';
  const d = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(d.getTime())) return '—';
  return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())} ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())} UTC`;
}

/** 2025-03-07 */
export function formatDate(value: Date | string | null | undefined): string {
  if (!value) return '—';
  const d = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(d.getTime())) return '—';
  return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())}`;
}

const sig4 = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4, useGrouping: false });

/** A number to 4 significant figures without exponent notation for ordinary magnitudes. */
export function formatSig4(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return sig4.format(value);
}

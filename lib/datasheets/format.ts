// Number and unit formatting for datasheets. Tests format the engine's figures with these same
// functions, so the PDF and the check agree on rounding by construction, not by coincidence.
const cache = new Map<number, Intl.NumberFormat>();

function formatter(decimals: number): Intl.NumberFormat {
  let f = cache.get(decimals);
  if (!f) {
    // signDisplay 'negative' keeps a rounded -0.0 from printing as "-0.0".
    f = new Intl.NumberFormat('en-US', {
      minimumFractionDigits: decimals,
      maximumFractionDigits: decimals,
      useGrouping: true,
      signDisplay: 'negative',
    });
    cache.set(decimals, f);
  }
  return f;
}

/** A number to a fixed count of decimals with thousands separators: 1,547.66. */
export function formatFixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  return formatter(decimals).format(value);
}

/** About four significant figures without dropping integer digits: 24,321 / 173.2 / 12.35 / 0.512. */
export function formatFigure(value: number): string {
  const a = Math.abs(value);
  return formatFixed(value, a >= 1000 ? 0 : a >= 100 ? 1 : a >= 10 ? 2 : 3);
}

const plain = new Intl.NumberFormat('en-US', { maximumFractionDigits: 3, useGrouping: true });

/** A catalogue value as listed (315, 18.5, 0.55): no padding decimals. */
export function formatRating(value: number): string {
  return Number.isFinite(value) ? plain.format(value) : '—';
}

export const formatTemperatureC = (c: number) => `${formatFixed(c, 1)} °C`;
export const formatPercent = (p: number) => `${formatFixed(p, 2)} %`;
export const formatKw = (kw: number) => `${formatFigure(kw)} kW`;
export const formatKpa = (kpa: number) => `${formatFigure(kpa)} kPa abs`;
export const formatAmps = (a: number) => `${formatFixed(a, 1)} A`;

const UNIT_LABELS: Record<string, string> = {
  degC: '°C',
  degF: '°F',
  degR: '°R',
  'm3/h': 'm³/h',
  'Nm3/h': 'Nm³/h',
  'Sm3/h': 'Sm³/h',
};

/** How a canonical unit string is printed (°C for degC, Nm³/h for Nm3/h). */
export function unitLabel(unit: string): string {
  return UNIT_LABELS[unit] ?? unit;
}

/** A quantity as the user entered it, unrounded: "3 barg", "5400 SCFM". */
export function formatEntered(q: { value: number; unit: string } | null | undefined): string {
  if (!q) return '—';
  return `${q.value} ${unitLabel(q.unit)}`;
}

/** 2026-03-07 in UTC, the date printed in revision tables. */
export function formatIssueDate(iso: string): string {
  return iso.slice(0, 10);
}

const SEVERITY_LABELS = { danger: 'DANGER', warning: 'WARNING', caution: 'CAUTION', info: 'NOTE' } as const;

/** The word printed beside a caution. */
export function severityLabel(severity: keyof typeof SEVERITY_LABELS): string {
  return SEVERITY_LABELS[severity];
}

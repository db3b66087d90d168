import { KG_PER_LB, M3_PER_FT3, PA_PER_KPA, PA_PER_PSI, type UnitSystem } from '@/lib/units';

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

export const formatPercent = (p: number) => `${formatFixed(p, 2)} %`;
export const formatKw = (kw: number) => `${formatFigure(kw)} kW`;

// The unit system a sheet is printed in: the account's. The blocks of a sheet are built in one synchronous pass
// inside withSheetUnits, so concurrent renders never see each other's system.
let sheetSystem: UnitSystem = 'si';

/** Builds a sheet's text in the given unit system (SI outside any call). */
export function withSheetUnits<T>(system: UnitSystem, build: () => T): T {
  const before = sheetSystem;
  sheetSystem = system;
  try {
    return build();
  } finally {
    sheetSystem = before;
  }
}

const us = () => sheetSystem === 'us';
const LB_PER_H_PER_KG_PER_H = 1 / KG_PER_LB;
const ACFM_PER_M3_PER_H = 1 / (M3_PER_FT3 * 60);
const PSI_PER_KPA = PA_PER_KPA / PA_PER_PSI;
const LB_PER_FT3_PER_KG_PER_M3 = M3_PER_FT3 / KG_PER_LB;

/** Temperature figures and their unit: °C, or °F for US customary sheets (one decimal). */
export const temperatureFigure = (c: number) => formatFixed(us() ? c * 1.8 + 32 : c, 1);
export const temperatureUnit = () => (us() ? '°F' : '°C');
export const formatTemperatureC = (c: number) => `${temperatureFigure(c)} ${temperatureUnit()}`;
/** A temperature difference: K, or °F of difference. */
export const formatTemperatureDifferenceK = (k: number) =>
  us() ? `${formatFixed(k * 1.8, 1)} °F` : `${formatFixed(k, 1)} K`;
/** Absolute pressures, about four significant figures: kPa abs or psia. */
export const pressureFigure = (kpa: number) => formatFigure(us() ? kpa * PSI_PER_KPA : kpa);
export const pressureUnit = () => (us() ? 'psia' : 'kPa abs');
export const formatKpa = (kpa: number) => `${pressureFigure(kpa)} ${pressureUnit()}`;
/** Mass flows given in kg/h: kg/h or lb/h, about four significant figures. */
export const massFlowFigure = (kgPerH: number) => formatFigure(us() ? kgPerH * LB_PER_H_PER_KG_PER_H : kgPerH);
export const massFlowUnit = () => (us() ? 'lb/h' : 'kg/h');
export const formatKgPerH = (kgPerH: number) => `${massFlowFigure(kgPerH)} ${massFlowUnit()}`;
/** Mass flows per second, four decimals: kg/s or lb/s. */
export const formatKgPerS = (kgPerS: number) =>
  us() ? `${formatFixed(kgPerS / KG_PER_LB, 4)} lb/s` : `${formatFixed(kgPerS, 4)} kg/s`;
/** Actual volume flows given in m³/h: m³/h or ACFM. */
export const formatActualM3PerH = (m3PerH: number) =>
  us() ? `${formatFigure(m3PerH * ACFM_PER_M3_PER_H)} ACFM` : `${formatFigure(m3PerH)} m³/h`;
/** Densities: kg/m³ or lb/ft³. */
export const densityFigure = (kgPerM3: number) => formatFigure(us() ? kgPerM3 * LB_PER_FT3_PER_KG_PER_M3 : kgPerM3);
export const densityUnit = () => (us() ? 'lb/ft³' : 'kg/m³');
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

import {
  ABSOLUTE_PRESSURE_UNITS,
  ACTUAL_FLOW_UNITS,
  GAUGE_PRESSURE_UNITS,
  MASS_FLOW_UNITS,
  STANDARD_FLOW_UNITS,
  TEMPERATURE_UNITS,
  isUnitOf,
} from '@/lib/units';
import type { FieldKind } from './form-types';

export type UnitSystem = 'si' | 'us';

/** Families a unit belongs to; switching the unit system keeps the family (gauge stays gauge). */
export type UnitFamily =
  'massFlow' | 'standardFlow' | 'actualFlow' | 'temperature' | 'gaugePressure' | 'absolutePressure' | 'barometric';

/** Each system's unit per family: what the desk shows before anyone overrides a field [cp]. */
export const SYSTEM_UNITS: Readonly<Record<UnitSystem, Readonly<Record<UnitFamily, string>>>> = {
  si: {
    massFlow: 'kg/h',
    standardFlow: 'Nm3/h',
    actualFlow: 'm3/h',
    temperature: 'degC',
    gaugePressure: 'barg',
    absolutePressure: 'bar',
    barometric: 'kPa',
  },
  us: {
    massFlow: 'lb/h',
    standardFlow: 'SCFM',
    actualFlow: 'ACFM',
    temperature: 'degF',
    gaugePressure: 'psig',
    absolutePressure: 'psia',
    barometric: 'psia',
  },
};

const LABELS: Readonly<Record<string, string>> = {
  degC: '°C',
  degF: '°F',
  K: 'K',
  degR: '°R',
  'Nm3/h': 'Nm³/h',
  'Sm3/h': 'Sm³/h',
  'm3/h': 'm³/h (actual)',
  ACFM: 'ACFM (actual)',
  kPa: 'kPa abs',
  MPa: 'MPa abs',
  Pa: 'Pa abs',
  bar: 'bar abs',
  psia: 'psia',
  kPag: 'kPa g',
  barg: 'bar g',
  psig: 'psig',
};

/** How a unit reads beside a number: "°C", "Nm³/h", "bar g", "kPa abs". */
export function unitLabel(unit: string): string {
  return LABELS[unit] ?? unit;
}

export type UnitGroup = { label: string; units: readonly string[] };

/** The options of each kind of unit picker, grouped so gauge and absolute are never confused. */
export const UNIT_GROUPS: Readonly<Record<FieldKind, readonly UnitGroup[]>> = {
  flow: [
    { label: 'Mass flow', units: MASS_FLOW_UNITS },
    { label: 'Standard volume', units: STANDARD_FLOW_UNITS },
    { label: 'Actual volume at inlet', units: ACTUAL_FLOW_UNITS },
  ],
  temperature: [{ label: 'Temperature', units: TEMPERATURE_UNITS }],
  pressure: [
    { label: 'Gauge (above site barometric)', units: GAUGE_PRESSURE_UNITS },
    { label: 'Absolute', units: ABSOLUTE_PRESSURE_UNITS.filter((u) => u !== 'Pa') },
  ],
  barometric: [{ label: 'Absolute', units: ['kPa', 'bar', 'psia'] }],
};

/** The family of a unit in a picker of `kind`. */
export function unitFamily(kind: FieldKind, unit: string): UnitFamily {
  if (kind === 'temperature') return 'temperature';
  if (kind === 'barometric') return 'barometric';
  if (kind === 'pressure') return isUnitOf(GAUGE_PRESSURE_UNITS, unit) ? 'gaugePressure' : 'absolutePressure';
  if (isUnitOf(STANDARD_FLOW_UNITS, unit)) return 'standardFlow';
  if (isUnitOf(ACTUAL_FLOW_UNITS, unit)) return 'actualFlow';
  return 'massFlow';
}

/** The unit a field of `kind` now in `unit` takes when the whole desk switches to `system`. */
export function systemUnitFor(kind: FieldKind, unit: string, system: UnitSystem): string {
  return SYSTEM_UNITS[system][unitFamily(kind, unit)];
}

const US_UNITS: ReadonlySet<string> = new Set([
  'degF',
  'degR',
  'psia',
  'psig',
  'lb/h',
  'lb/s',
  'SCFM',
  'SCFH',
  'MMSCFD',
  'ACFM',
]);

/** The system most of a request's units belong to (inlet state and flow), for someone with no saved preference. */
export function systemOfUnits(units: readonly string[]): UnitSystem {
  const us = units.filter((u) => US_UNITS.has(u)).length;
  return us * 2 > units.length ? 'us' : 'si';
}

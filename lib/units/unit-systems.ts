// The desk's two unit systems: which unit of each family a number is shown in, and how units read.

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
  'SCFM@14.65': 'SCFM (14.65 psia)',
  'MMSCFD@14.65': 'MMSCFD (14.65 psia)',
  'SCFM@14.73': 'SCFM (14.73 psia)',
  'MMSCFD@14.73': 'MMSCFD (14.73 psia)',
  'SCFM@68F': 'SCFM (68 °F)',
  'FAD m3/min': 'm³/min FAD',
  'FAD m3/h': 'm³/h FAD',
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
  'SCFM@14.65',
  'MMSCFD@14.65',
  'SCFM@14.73',
  'MMSCFD@14.73',
  'SCFM@68F',
  'ACFM',
]);

/** The system most of a request's units belong to (inlet state and flow), for someone with no saved preference. */
export function systemOfUnits(units: readonly string[]): UnitSystem {
  const us = units.filter((u) => US_UNITS.has(u)).length;
  return us * 2 > units.length ? 'us' : 'si';
}

/** Accepted unit strings per quantity kind; the form builds its unit pickers from these lists. */
export const MASS_FLOW_UNITS = ['kg/s', 'kg/h', 't/h', 'lb/h', 'lb/s'] as const;
export const STANDARD_FLOW_UNITS = [
  'Nm3/h',
  'Sm3/h',
  'SCFM',
  'SCFH',
  'MMSCFD',
  'SCFM@14.65',
  'MMSCFD@14.65',
  'SCFM@14.73',
  'MMSCFD@14.73',
  'SCFM@68F',
  'FAD m3/min',
  'FAD m3/h',
] as const;
export const ACTUAL_FLOW_UNITS = ['m3/h', 'ACFM'] as const;
export const FLOW_UNITS = [...MASS_FLOW_UNITS, ...STANDARD_FLOW_UNITS, ...ACTUAL_FLOW_UNITS] as const;
export const TEMPERATURE_UNITS = ['degC', 'degF', 'K', 'degR'] as const;
export const ABSOLUTE_PRESSURE_UNITS = ['kPa', 'MPa', 'Pa', 'bar', 'psia'] as const;
export const GAUGE_PRESSURE_UNITS = ['kPag', 'barg', 'psig'] as const;
export const PRESSURE_UNITS = [...ABSOLUTE_PRESSURE_UNITS, ...GAUGE_PRESSURE_UNITS] as const;
export const POWER_UNITS = ['kW', 'W', 'MW', 'hp', 'Btu/h'] as const;

export type MassFlowUnit = (typeof MASS_FLOW_UNITS)[number];
export type StandardFlowUnit = (typeof STANDARD_FLOW_UNITS)[number];
export type ActualFlowUnit = (typeof ACTUAL_FLOW_UNITS)[number];
export type FlowUnit = (typeof FLOW_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export type AbsolutePressureUnit = (typeof ABSOLUTE_PRESSURE_UNITS)[number];
export type GaugePressureUnit = (typeof GAUGE_PRESSURE_UNITS)[number];
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export type PowerUnit = (typeof POWER_UNITS)[number];

export const UNITS_BY_KIND = {
  massFlow: MASS_FLOW_UNITS,
  standardFlow: STANDARD_FLOW_UNITS,
  actualFlow: ACTUAL_FLOW_UNITS,
  flow: FLOW_UNITS,
  temperature: TEMPERATURE_UNITS,
  absolutePressure: ABSOLUTE_PRESSURE_UNITS,
  gaugePressure: GAUGE_PRESSURE_UNITS,
  pressure: PRESSURE_UNITS,
  power: POWER_UNITS,
} as const;

export type UnitListKind = keyof typeof UNITS_BY_KIND;

// Typographic spellings people paste from datasheets. Anything else must match exactly (case matters:
// "MPa" and "mPa" differ by 10^9).
const ALIASES: Readonly<Record<string, string>> = {
  '°C': 'degC',
  '℃': 'degC',
  '°F': 'degF',
  '℉': 'degF',
  '°R': 'degR',
  '°K': 'K',
};

/** The canonical spelling of a unit string: superscript ³ becomes 3, degree signs become deg*. */
export function normalizeUnit(raw: string): string {
  const trimmed = raw.trim();
  const plain = trimmed.includes('³') ? trimmed.replaceAll('³', '3') : trimmed;
  return ALIASES[plain] ?? plain;
}

/** True when `unit` (canonical) belongs to `list`. */
export function isUnitOf<T extends string>(list: readonly T[], unit: string): unit is T {
  return (list as readonly string[]).includes(unit);
}

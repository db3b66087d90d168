import { GAS_CONSTANT_J_PER_MOL_K } from '../thermo/constants';
import { KG_PER_LB, KG_PER_TONNE, M3_PER_FT3, PA_PER_PSI, SECONDS_PER_HOUR } from './factors';
import { UnitError } from './unit-error';
import type { FlowUnit, StandardFlowUnit } from './unit-strings';

/**
 * What a volumetric flow needs to become a mass flow: the gas and, for actual flow, the inlet state.
 * `zAt` gives the gas's compressibility factor at a state; without it the gas is ideal (Z = 1). With it,
 * standard volumes use the real Z at their reference conditions (ISO 13443 defines the conditions, ISO 6976
 * practice takes Z there) and actual volumes the real Z at the inlet.
 */
export type FlowContext = {
  molarMassKgPerKmol: number;
  temperatureK: number;
  pressurePa: number;
  zAt?: (temperatureK: number, pressurePa: number) => number;
};

export type StandardFlowBasis = {
  readonly unit: StandardFlowUnit;
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly description: string;
  /** m3 at the reference state per (unit x hour), i.e. the volume-per-hour factor. */
  readonly m3PerHourPerUnit: number;
};

const US_STANDARD_T_K = (60 + 459.67) / 1.8;
const US_68F_K = (68 + 459.67) / 1.8;
const US_STANDARD_P_PA = 14.696 * PA_PER_PSI;
const US_BASIS = '60 °F and 14.696 psia (US gas-industry practice; other bases such as 14.65 or 14.73 psia exist)';
const SCFM_PER_HOUR = M3_PER_FT3 * 60;
const MMSCFD_PER_HOUR = (M3_PER_FT3 * 1e6) / 24;

function usBasis(unit: StandardFlowUnit, temperatureK: number, psia: number, m3PerHourPerUnit: number, note: string) {
  const fahrenheit = Math.round(temperatureK * 1.8 - 459.67);
  return {
    unit,
    temperatureK,
    pressurePa: psia * PA_PER_PSI,
    description: `${fahrenheit} °F and ${psia} psia (${note})`,
    m3PerHourPerUnit,
  };
}

/** Reference states of the standard-volume units; printed on the datasheet basis line. */
export const STANDARD_FLOW_BASES: Readonly<Record<StandardFlowUnit, StandardFlowBasis>> = {
  'Nm3/h': {
    unit: 'Nm3/h',
    temperatureK: 273.15,
    pressurePa: 101_325,
    description: '0 °C and 101.325 kPa (DIN 1343)',
    m3PerHourPerUnit: 1,
  },
  'Sm3/h': {
    unit: 'Sm3/h',
    temperatureK: 288.15,
    pressurePa: 101_325,
    description: '15 °C and 101.325 kPa (ISO 13443)',
    m3PerHourPerUnit: 1,
  },
  SCFM: {
    unit: 'SCFM',
    temperatureK: US_STANDARD_T_K,
    pressurePa: US_STANDARD_P_PA,
    description: US_BASIS,
    m3PerHourPerUnit: SCFM_PER_HOUR,
  },
  SCFH: {
    unit: 'SCFH',
    temperatureK: US_STANDARD_T_K,
    pressurePa: US_STANDARD_P_PA,
    description: US_BASIS,
    m3PerHourPerUnit: M3_PER_FT3,
  },
  MMSCFD: {
    unit: 'MMSCFD',
    temperatureK: US_STANDARD_T_K,
    pressurePa: US_STANDARD_P_PA,
    description: US_BASIS,
    m3PerHourPerUnit: MMSCFD_PER_HOUR,
  },
  // Other bases gas contracts and compressor ratings are quoted in [cp: US gas-industry practice; 14.73 psia is
  // the AGA Report No. 3 base, 14.65 psia a common state contract base, 68 °F a compressed-air rating base].
  'SCFM@14.65': usBasis('SCFM@14.65', US_STANDARD_T_K, 14.65, SCFM_PER_HOUR, 'contract base'),
  'MMSCFD@14.65': usBasis('MMSCFD@14.65', US_STANDARD_T_K, 14.65, MMSCFD_PER_HOUR, 'contract base'),
  'SCFM@14.73': usBasis('SCFM@14.73', US_STANDARD_T_K, 14.73, SCFM_PER_HOUR, 'AGA Report No. 3 base'),
  'MMSCFD@14.73': usBasis('MMSCFD@14.73', US_STANDARD_T_K, 14.73, MMSCFD_PER_HOUR, 'AGA Report No. 3 base'),
  'SCFM@68F': usBasis('SCFM@68F', US_68F_K, 14.696, SCFM_PER_HOUR, 'rating base used for air'),
  // Free air delivery: volume at the standard inlet conditions of ISO 1217 (20 °C, 100 kPa, dry) [mem: ISO 1217 annex].
  'FAD m3/min': {
    unit: 'FAD m3/min',
    temperatureK: 293.15,
    pressurePa: 100_000,
    description: '20 °C and 100 kPa, dry (ISO 1217 free air delivery)',
    m3PerHourPerUnit: 60,
  },
  'FAD m3/h': {
    unit: 'FAD m3/h',
    temperatureK: 293.15,
    pressurePa: 100_000,
    description: '20 °C and 100 kPa, dry (ISO 1217 free air delivery)',
    m3PerHourPerUnit: 1,
  },
};

const R = GAS_CONSTANT_J_PER_MOL_K;

// Per-unit factors fixed at module load (imported bindings are getters under tsx's CommonJS output).
const KG_PER_S_PER_MASS_UNIT: Readonly<Record<string, number>> = {
  'kg/s': 1,
  'kg/h': 1 / SECONDS_PER_HOUR,
  't/h': KG_PER_TONNE / SECONDS_PER_HOUR,
  'lb/h': KG_PER_LB / SECONDS_PER_HOUR,
  'lb/s': KG_PER_LB,
};
/** kmol/s per unit of standard volume flow for an ideal gas: n = p V / (R T) at the basis. */
const KMOL_PER_S_PER_STANDARD_UNIT: Readonly<Record<string, number>> = Object.fromEntries(
  Object.values(STANDARD_FLOW_BASES).map((b) => [
    b.unit,
    (b.pressurePa * b.m3PerHourPerUnit) / (1000 * R * b.temperatureK * SECONDS_PER_HOUR),
  ]),
);
/** Actual m3/s per unit of actual volume flow. */
const M3_PER_S_PER_ACTUAL_UNIT: Readonly<Record<string, number>> = {
  'm3/h': 1 / SECONDS_PER_HOUR,
  ACFM: (M3_PER_FT3 * 60) / SECONDS_PER_HOUR,
};

// kg/s per unit for each flow unit, given the context; density rho = p M / (Z R T).
function kgPerSPerUnit(unit: string, ctx: FlowContext | undefined): number {
  const mass = KG_PER_S_PER_MASS_UNIT[unit];
  if (mass !== undefined) return mass;
  const standard = KMOL_PER_S_PER_STANDARD_UNIT[unit];
  if (standard !== undefined) {
    if (!ctx) throw new UnitError(`"${unit}" needs the gas molar mass to become a mass flow`);
    if (!ctx.zAt) return standard * ctx.molarMassKgPerKmol;
    const basis = STANDARD_FLOW_BASES[unit as StandardFlowUnit];
    return (standard * ctx.molarMassKgPerKmol) / ctx.zAt(basis.temperatureK, basis.pressurePa);
  }
  const actual = M3_PER_S_PER_ACTUAL_UNIT[unit];
  if (actual === undefined) throw new UnitError(`unknown flow unit "${unit}"`);
  if (!ctx) throw new UnitError(`"${unit}" needs the gas and the inlet state to become a mass flow`);
  const z = ctx.zAt ? ctx.zAt(ctx.temperatureK, ctx.pressurePa) : 1;
  return (actual * ctx.pressurePa * ctx.molarMassKgPerKmol) / (1000 * z * R * ctx.temperatureK);
}

/** Mass flow, kg/s, from any flow unit (standard volumes at their named basis, actual at `ctx`). */
export function flowToKgPerS(value: number, unit: FlowUnit | string, ctx?: FlowContext): number {
  return value * kgPerSPerUnit(unit, ctx);
}

/** A mass flow in kg/s expressed in any flow unit. */
export function flowFromKgPerS(massFlowKgPerS: number, unit: FlowUnit | string, ctx?: FlowContext): number {
  return massFlowKgPerS / kgPerSPerUnit(unit, ctx);
}

import { checkComposition } from '../thermo/composition';
import { MAX_TEMPERATURE_K, MIN_TEMPERATURE_K } from '../thermo/constants';
import type { GasModel } from '../thermo/gas-model';
import { findPreset, humidAirGas, mixtureGas, presetGas } from '../thermo/presets';
// Leaf modules rather than the package index: each index re-export adds a getter per call under tsx.
import { STANDARD_FLOW_BASES, flowToKgPerS as flowToKgPerSImported } from '../units/flow';
import {
  STANDARD_ATMOSPHERE_PA,
  isGaugePressureUnit,
  pressureFromPa,
  pressureToPa as pressureToPaImported,
} from '../units/pressure';
import { standardAtmospherePressurePa } from '../units/standard-atmosphere';
import { temperatureFromK, temperatureToK as temperatureToKImported } from '../units/temperature';
import type { StandardFlowUnit } from '../units/unit-strings';
import { EosError } from '../thermo/eos/eos-error';
import { GAS_CONSTANT_J_PER_MOL_K } from '../thermo/constants';
import type { SizingIssue } from './input-error';
import { chooseEquation, outsideGerg, type EquationChoice } from './real-gas/equation-choice';
import { compressibility, realFluid, type RealFluid } from './real-gas/fluid';
import { checkInletPhase } from './real-gas/phase-check';
import type { InletClassification } from '../thermo/phase';
import type { BasisInfo } from './result-types';
import type { GasInput, QuantityInput, SizingInput } from './schema';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const flowToKgPerS = flowToKgPerSImported;
const pressureToPa = pressureToPaImported;
const temperatureToK = temperatureToKImported;
const T_MIN = MIN_TEMPERATURE_K;
const T_MAX = MAX_TEMPERATURE_K;
const R = GAS_CONSTANT_J_PER_MOL_K;

/** Pressures the engine accepts, Pa absolute (the ideal-gas warnings take over long before the top). */
export const MAX_PRESSURE_PA = 100e6;
/** Largest mass flow accepted, kg/s: beyond any single process heater or compressor. */
export const MAX_MASS_FLOW_KG_PER_S = 10_000;
const BAROMETRIC_RANGE_PA = [40_000, 110_000] as const;

/** The state every sizing starts from, in SI units. */
export type ResolvedCommon = {
  gas: GasModel;
  /** The inlet's phase (gas or supercritical here; liquid and two-phase inlets are refused), with its dew point. */
  inletClass: InletClassification;
  equation: EquationChoice;
  /** The real-gas equation compiled for the gas; null when ideal gas was asked for. */
  fluid: RealFluid | null;
  /** Z at a state on the sizing's equation (1 for ideal gas); used for standard and actual volumes. */
  zAt: ((temperatureK: number, pressurePa: number) => number) | undefined;
  /** Z and density at the inlet. */
  inletZ: number;
  inletDensityKgPerM3: number;
  massFlowKgPerS: number;
  inletTemperatureK: number;
  inletPressurePa: number;
  barometricPressurePa: number;
  barometricSource: BasisInfo['barometricPressureSource'];
  flowInputUnit: string;
};

const fmt = (v: number) => String(Number(v.toPrecision(6)));

/** A temperature in K, or an issue when outside the property data (typed input may skip the schema). */
export function resolveTemperatureK(q: QuantityInput, path: string, issues: SizingIssue[]): number {
  const t = temperatureToK(q.value, q.unit);
  if (!(t >= T_MIN && t <= T_MAX)) {
    const lo = fmt(temperatureFromK(MIN_TEMPERATURE_K, q.unit));
    const hi = fmt(temperatureFromK(MAX_TEMPERATURE_K, q.unit));
    const why = t < 0 ? 'is below absolute zero' : `is outside the property data range ${lo} to ${hi} ${q.unit}`;
    issues.push({ path, message: `${q.value} ${q.unit} ${why}` });
  }
  return t;
}

/** An absolute pressure in Pa, or an issue when not above vacuum or above 100 MPa. */
export function resolvePressurePa(q: QuantityInput, path: string, barometricPa: number, issues: SizingIssue[]): number {
  const p = pressureToPa(q.value, q.unit, barometricPa);
  if (!(p > 0 && p <= MAX_PRESSURE_PA)) {
    const gauge = isGaugePressureUnit(q.unit) ? ` (gauge, against ${fmt(barometricPa / 1000)} kPa barometric)` : '';
    const lowest = isGaugePressureUnit(q.unit) ? ` (${fmt(pressureFromPa(0, q.unit, barometricPa))} ${q.unit})` : '';
    const range = `allowed: above 0 kPa absolute${lowest} and at most ${fmt(MAX_PRESSURE_PA / 1e6)} MPa absolute`;
    issues.push({ path, message: `${q.value} ${q.unit}${gauge} gives ${fmt(p / 1000)} kPa absolute; ${range}` });
  }
  return p;
}

function resolveBarometric(input: SizingInput, issues: SizingIssue[]): [number, BasisInfo['barometricPressureSource']] {
  const site = input.site;
  if (site?.barometricPressure) {
    const p = pressureToPa(site.barometricPressure.value, site.barometricPressure.unit);
    if (!(p >= BAROMETRIC_RANGE_PA[0] && p <= BAROMETRIC_RANGE_PA[1])) {
      issues.push({
        path: 'site.barometricPressure',
        message: `site barometric pressure must be 40 to 110 kPa absolute; got ${fmt(p / 1000)} kPa`,
      });
    }
    return [p, 'site.barometricPressure'];
  }
  if (site?.altitudeM !== undefined) {
    return [standardAtmospherePressurePa(site.altitudeM), 'site.altitudeM (ISO 2533 standard atmosphere)'];
  }
  return [STANDARD_ATMOSPHERE_PA, 'default (101.325 kPa)'];
}

function resolveGas(g: GasInput, temperatureK: number, pressurePa: number, issues: SizingIssue[]): GasModel | null {
  if (g.components !== undefined) {
    const check = checkComposition(g.components, g.basis ?? 'mole');
    if (check.ok) return mixtureGas(check.moleFractions);
    for (const i of check.issues)
      issues.push({ path: i.path ? `gas.components.${i.path}` : 'gas.components', message: i.message });
    return null;
  }
  const preset = g.preset === undefined ? undefined : findPreset(g.preset);
  if (!preset) {
    issues.push({ path: 'gas.preset', message: `unknown gas preset "${g.preset ?? ''}"` });
    return null;
  }
  if (preset.moleFractions) return presetGas(preset.id) ?? null;
  const spec =
    g.relativeHumidityPercent !== undefined
      ? { relativeHumidityPercent: g.relativeHumidityPercent }
      : g.dewPoint !== undefined
        ? { dewPointK: temperatureToK(g.dewPoint.value, g.dewPoint.unit) }
        : undefined;
  if (!spec) {
    issues.push({
      path: 'gas.relativeHumidityPercent',
      message: 'humid air needs relativeHumidityPercent or dewPoint',
    });
    return null;
  }
  const humid = humidAirGas(spec, temperatureK, pressurePa);
  if (humid.ok) return humid.gas;
  const path = humid.field === 'temperature' ? 'inlet.temperature' : `gas.${humid.field}`;
  issues.push({ path, message: humid.message });
  return null;
}

/** Converts the common fields to SI and builds the gas; pushes an issue for every refused field. */
export function resolveCommon(input: SizingInput, issues: SizingIssue[]): ResolvedCommon | null {
  const before = issues.length;
  const [barometricPressurePa, barometricSource] = resolveBarometric(input, issues);
  const inletTemperatureK = resolveTemperatureK(input.inlet.temperature, 'inlet.temperature', issues);
  const inletPressurePa = resolvePressurePa(input.inlet.pressure, 'inlet.pressure', barometricPressurePa, issues);
  if (issues.length > before) return null;
  const gas = resolveGas(input.gas, inletTemperatureK, inletPressurePa, issues);
  if (!gas) return null;
  const equation = chooseEquation(gas, input.equationOfState);
  const missing = outsideGerg(gas);
  if (equation.id === 'gerg-2008' && missing.length > 0) {
    issues.push({
      path: 'equationOfState',
      message: `GERG-2008 does not cover ${missing.join(', ')}: use "peng-robinson" (or leave the field out to let the engine choose)`,
    });
    return null;
  }
  // A liquid or two-phase inlet is refused whatever equation was asked for, ideal gas included.
  const inletClass = checkInletPhase(gas, inletTemperatureK, inletPressurePa, issues);
  if (!inletClass) return null;
  const fluid = equation.id === 'ideal-gas' ? null : realFluid(gas, equation.id);
  const zAt = fluid ? zFunction(fluid) : undefined;
  const inletZ = zAt ? zAt(inletTemperatureK, inletPressurePa) : 1;
  const inletDensityKgPerM3 = (inletPressurePa * gas.molarMassKgPerKmol) / (1000 * inletZ * R * inletTemperatureK);
  const ctx = {
    molarMassKgPerKmol: gas.molarMassKgPerKmol,
    temperatureK: inletTemperatureK,
    pressurePa: inletPressurePa,
    zAt,
  };
  const massFlowKgPerS = flowToKgPerS(input.flow.value, input.flow.unit, ctx);
  if (!(massFlowKgPerS > 0 && massFlowKgPerS <= MAX_MASS_FLOW_KG_PER_S)) {
    issues.push({
      path: 'flow',
      message: `flow must be above 0 and at most ${MAX_MASS_FLOW_KG_PER_S} kg/s; got ${fmt(massFlowKgPerS)} kg/s`,
    });
    return null;
  }
  return {
    gas,
    inletClass,
    equation,
    fluid,
    zAt,
    inletZ,
    inletDensityKgPerM3,
    massFlowKgPerS,
    inletTemperatureK,
    inletPressurePa,
    barometricPressurePa,
    barometricSource,
    flowInputUnit: input.flow.unit,
  };
}

// Z on the gas branch; where the equation has no gas root (a standard state below a heavy gas's dew point,
// where the reference volume is notional anyway) the ideal gas stands in, as ISO 6976 does for such states.
function zFunction(fluid: RealFluid): (temperatureK: number, pressurePa: number) => number {
  return (t, p) => {
    try {
      return compressibility(fluid, t, p);
    } catch (err) {
      if (err instanceof EosError) return 1;
      throw err;
    }
  };
}

/** The named basis of a standard-volume flow unit, or undefined for mass and actual flow. */
export function standardBasisOf(unit: string) {
  return STANDARD_FLOW_BASES[unit as StandardFlowUnit];
}

import { EosError } from '../thermo/eos/eos-error';
import { ThermoRangeError } from '../thermo/errors';
import { CoolerFloodedError } from './real-gas/condensation';
import { STANDARD_FLOW_BASES } from '../units/flow';
import { flowFromKgPerS as flowFromKgPerSImported } from '../units/flow';
import { temperatureToK } from '../units/temperature';
import { UnitError } from '../units/unit-error';
import {
  COMPRESSOR_CONVENTIONS,
  HEATER_CONVENTIONS,
  REAL_GAS_COMPRESSOR_CONVENTIONS,
  REAL_GAS_HEATER_CONVENTIONS,
  buildBasis,
} from './basis';
import {
  DEFAULT_DISCHARGE_LIMIT_K,
  HYDROGEN_DISCHARGE_LIMIT_K,
  sizeCompressor,
  type CompressorCase,
} from './compressor';
import { DEFAULT_SUPPLY } from './electrical';
import { summarizeGas } from './gas-summary';
import { sizeHeater } from './heater';
import { SizingInputError, type SizingIssue } from './input-error';
import { DEFAULT_HEATER_RATINGS_KW } from './ratings';
import { resolveCommon, resolvePressurePa, resolveTemperatureK, type ResolvedCommon } from './resolve';
import type { CompressorResult, HeaterResult, SizingResult } from './result-types';
import { LIMITS, type CompressorInput, type HeaterInput, type SizingInput } from './schema';
import { compressorWarnings, heaterWarnings } from './warnings';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const flowFromKgPerS = flowFromKgPerSImported;

/** Bumped whenever a figure for the same input can change; saved beside every sizing. */
export const ENGINE_VERSION = '2.0.0';

// Below these a duty is zero to rounding and its percentages are meaningless.
const MIN_RISE_K = 0.01;
const MIN_PRESSURE_RATIO = 1.001;

const c2 = (k: number) => `${(k - 273.15).toFixed(2)} °C`;

// Built field by field (no object spread): this runs once per sizing in batches.
function commonResult(common: ResolvedCommon) {
  const { gas, massFlowKgPerS: m } = common;
  const ctx = {
    molarMassKgPerKmol: gas.molarMassKgPerKmol,
    temperatureK: common.inletTemperatureK,
    pressurePa: common.inletPressurePa,
    zAt: common.zAt,
  };
  const { summary, composition } = summarizeGas(gas);
  const sm3 = STANDARD_FLOW_BASES['Sm3/h'];
  return {
    engineVersion: ENGINE_VERSION,
    massFlowKgPerS: m,
    molarMassKgPerKmol: gas.molarMassKgPerKmol,
    inletTemperatureC: common.inletTemperatureK - 273.15,
    inletPressureKpa: common.inletPressurePa / 1000,
    inletZ: common.inletZ,
    inletDensityKgPerM3: common.inletDensityKgPerM3,
    inletActualFlowM3PerH: flowFromKgPerS(m, 'm3/h', ctx),
    flows: {
      normalM3PerH: flowFromKgPerS(m, 'Nm3/h', ctx),
      standardM3PerH: flowFromKgPerS(m, 'Sm3/h', ctx),
      scfm: flowFromKgPerS(m, 'SCFM', ctx),
      mmscfd: flowFromKgPerS(m, 'MMSCFD', ctx),
      fadM3PerMin: flowFromKgPerS(m, 'FAD m3/min', ctx),
      standardZ: common.zAt ? common.zAt(sm3.temperatureK, sm3.pressurePa) : 1,
    },
    gas: summary,
    composition,
  };
}

function heaterResult(input: HeaterInput, common: ResolvedCommon, issues: SizingIssue[]): HeaterResult {
  const outletK = resolveTemperatureK(input.outletTemperature, 'outletTemperature', issues);
  if (issues.length === 0 && !(outletK >= common.inletTemperatureK + MIN_RISE_K)) {
    issues.push({
      path: 'outletTemperature',
      message: `outlet ${c2(outletK)} must be above the inlet ${c2(common.inletTemperatureK)} (by at least ${MIN_RISE_K} K): a heater only adds heat`,
    });
  }
  if (issues.length > 0) throw new SizingInputError(issues);
  const supply = input.supply ?? DEFAULT_SUPPLY;
  const heater = sizeHeater({
    gas: common.gas,
    fluid: common.fluid,
    massFlowKgPerS: common.massFlowKgPerS,
    inletTemperatureK: common.inletTemperatureK,
    outletTemperatureK: outletK,
    pressurePa: common.inletPressurePa,
    heatLossPercent: input.heatLossPercent,
    designMarginPercent: input.designMarginPercent,
    voltageV: supply.voltageV,
    phases: supply.phases,
    ratingsKw: input.heaterRatingsKw ?? DEFAULT_HEATER_RATINGS_KW,
  });
  const r = commonResult(common);
  return {
    service: 'heater',
    engineVersion: r.engineVersion,
    massFlowKgPerS: r.massFlowKgPerS,
    molarMassKgPerKmol: r.molarMassKgPerKmol,
    inletTemperatureC: r.inletTemperatureC,
    inletPressureKpa: r.inletPressureKpa,
    inletZ: r.inletZ,
    inletDensityKgPerM3: r.inletDensityKgPerM3,
    inletActualFlowM3PerH: r.inletActualFlowM3PerH,
    flows: r.flows,
    gas: r.gas,
    heater,
    basis: buildBasis(common, r.composition, HEATER_CONVENTIONS, REAL_GAS_HEATER_CONVENTIONS),
    warnings: heaterWarnings(common, heater),
  };
}

function compressorCase(input: CompressorInput, common: ResolvedCommon, issues: SizingIssue[]): CompressorCase {
  const p1 = common.inletPressurePa;
  const p2 = resolvePressurePa(input.dischargePressure, 'dischargePressure', common.barometricPressurePa, issues);
  if (issues.length === 0 && !(p2 >= p1 * MIN_PRESSURE_RATIO)) {
    issues.push({
      path: 'dischargePressure',
      message: `discharge ${(p2 / 1000).toFixed(3)} kPa abs must be above the suction ${(p1 / 1000).toFixed(3)} kPa abs (pressure ratio at least ${MIN_PRESSURE_RATIO})`,
    });
  }
  const coolK = input.intercoolerOutletTemperature
    ? resolveTemperatureK(input.intercoolerOutletTemperature, 'intercoolerOutletTemperature', issues)
    : common.inletTemperatureK;
  const afterK = input.aftercoolerOutletTemperature
    ? resolveTemperatureK(input.aftercoolerOutletTemperature, 'aftercoolerOutletTemperature', issues)
    : null;
  const hydrogenRich = (common.gas.moleFractions.H2 ?? 0) >= 0.5;
  const limitK = input.dischargeTemperatureLimit
    ? temperatureToK(input.dischargeTemperatureLimit.value, input.dischargeTemperatureLimit.unit)
    : hydrogenRich
      ? HYDROGEN_DISCHARGE_LIMIT_K
      : DEFAULT_DISCHARGE_LIMIT_K;
  const r = common.gas.gasConstantJPerKgK;
  checkPropertyOverrides(input.k, input.cpJPerKgK, r, issues);
  checkEfficiencies(input, issues);
  if (issues.length === 0 && input.dischargeTemperatureLimit && !(limitK > common.inletTemperatureK)) {
    issues.push({
      path: 'dischargeTemperatureLimit',
      message: `the discharge-temperature limit ${c2(limitK)} must be above the suction temperature ${c2(common.inletTemperatureK)}`,
    });
  }
  if (!(Number.isInteger(input.stages) && input.stages >= 1 && input.stages <= 6)) {
    issues.push({ path: 'stages', message: 'stages must be a whole number from 1 to 6' });
  }
  if (issues.length > 0) throw new SizingInputError(issues);
  return {
    gas: common.gas,
    massFlowKgPerS: common.massFlowKgPerS,
    suctionTemperatureK: common.inletTemperatureK,
    suctionPressurePa: p1,
    dischargePressurePa: p2,
    interstageDropFraction: input.interstagePressureDropPercent / 100,
    intercoolerOutletTemperatureK: coolK,
    aftercoolerOutletTemperatureK: afterK,
    kOverride: input.k ?? null,
    cpOverride: input.cpJPerKgK ?? null,
    stages: input.stages,
    isentropicEfficiency: input.isentropicEfficiency ?? null,
    polytropicEfficiency: input.isentropicEfficiency === undefined ? (input.polytropicEfficiency ?? null) : null,
    method: input.method,
    mechanicalEfficiency: input.mechanicalEfficiency,
    dischargeLimitK: limitK,
    motorEfficiency: input.motorEfficiency ?? null,
    motorPowerFactor: input.motorPowerFactor ?? null,
    supply: input.supply ?? null,
    fluid: common.fluid,
  };
}

// Typed input (the batch path) skips the schema, so its bounds are checked again here, each on its own field.
function checkEfficiencies(input: CompressorInput, issues: SizingIssue[]): void {
  const given = [input.isentropicEfficiency, input.polytropicEfficiency].filter((e) => e !== undefined).length;
  if (given !== 1) {
    issues.push({
      path: 'isentropicEfficiency',
      message: 'give exactly one of isentropicEfficiency or polytropicEfficiency',
    });
  }
  const fields = [
    ['isentropicEfficiency', input.isentropicEfficiency, LIMITS.isentropicEfficiency],
    ['polytropicEfficiency', input.polytropicEfficiency, LIMITS.polytropicEfficiency],
    ['mechanicalEfficiency', input.mechanicalEfficiency, LIMITS.mechanicalEfficiency],
  ] as const;
  for (const [path, value, range] of fields) {
    if (value !== undefined && !(value >= range.min && value <= range.max)) {
      issues.push({ path, message: `${value} is out of range (allowed: from ${range.min} to ${range.max})` });
    }
  }
}

function compressorResult(input: CompressorInput, common: ResolvedCommon, issues: SizingIssue[]): CompressorResult {
  const c = compressorCase(input, common, issues);
  let compressor;
  try {
    compressor = sizeCompressor(c);
  } catch (err) {
    if (err instanceof CoolerFloodedError) {
      throw new SizingInputError([{ path: 'intercoolerOutletTemperature', message: err.message }]);
    }
    if (err instanceof EosError) {
      throw new SizingInputError([
        {
          path: 'dischargePressure',
          message: `the ${common.equation.id} equation of state has no gas-phase state along this compression (${err.message}): check that the gas stays a gas at the discharge and cooler outlets, or use fewer stages of cooling`,
        },
      ]);
    }
    if (!(err instanceof ThermoRangeError)) throw err;
    throw new SizingInputError([
      {
        path: 'dischargePressure',
        message:
          'the predicted discharge temperature is above 6000 K, outside the property data: use more stages or a lower pressure ratio',
      },
    ]);
  }
  const r = commonResult(common);
  return {
    service: 'compressor',
    engineVersion: r.engineVersion,
    massFlowKgPerS: r.massFlowKgPerS,
    molarMassKgPerKmol: r.molarMassKgPerKmol,
    inletTemperatureC: r.inletTemperatureC,
    inletPressureKpa: r.inletPressureKpa,
    inletZ: r.inletZ,
    inletDensityKgPerM3: r.inletDensityKgPerM3,
    inletActualFlowM3PerH: r.inletActualFlowM3PerH,
    flows: r.flows,
    gas: r.gas,
    compressor,
    basis: buildBasis(common, r.composition, COMPRESSOR_CONVENTIONS, REAL_GAS_COMPRESSOR_CONVENTIONS),
    warnings: compressorWarnings(common, compressor, c),
  };
}

/**
 * Sizes an already-validated request (the schema's output type) without running zod: the batch path.
 * Physical checks that need unit conversion still run and throw SizingInputError.
 */
export function calculateCore(input: SizingInput): SizingResult {
  const issues: SizingIssue[] = [];
  try {
    const common = resolveCommon(input, issues);
    if (!common) throw new SizingInputError(issues);
    return input.service === 'heater' ? heaterResult(input, common, issues) : compressorResult(input, common, issues);
  } catch (err) {
    // Only typed input that bypassed the schema can carry a unit string outside the lists.
    if (err instanceof UnitError) throw new SizingInputError([{ path: '', message: err.message }]);
    throw err;
  }
}

// An ideal gas has cp - cv = R, so cp alone fixes k = cp / (cp - R); a k and cp given together must agree
// with the gas's R. The tolerance leaves room for figures rounded on a data sheet, not for another gas.
const OVERRIDE_R_TOLERANCE = 0.05;

function checkPropertyOverrides(k: number | undefined, cp: number | undefined, r: number, issues: SizingIssue[]): void {
  if (cp === undefined) return;
  const kMax = LIMITS.k.max;
  const cpMin = (r * kMax) / (kMax - 1);
  if (!(cp >= cpMin)) {
    issues.push({
      path: 'cpJPerKgK',
      message: `cp must be at least ${cpMin.toFixed(1)} J/(kg K) for this gas (R = ${r.toFixed(2)} J/(kg K)): a lower cp implies k = cp/(cp - R) above ${kMax}`,
    });
    return;
  }
  if (k === undefined) return;
  const impliedR = (cp * (k - 1)) / k;
  if (Math.abs(impliedR - r) > OVERRIDE_R_TOLERANCE * r) {
    issues.push({
      path: 'cpJPerKgK',
      message: `k ${k} and cp ${cp} J/(kg K) imply R = cp (k - 1)/k = ${impliedR.toFixed(1)} J/(kg K), but this gas has R = ${r.toFixed(2)} J/(kg K) (cp - cv = R); give one of them, or a pair within ${OVERRIDE_R_TOLERANCE * 100} %`,
    });
  }
}

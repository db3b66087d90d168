import { ZERO_CELSIUS_K } from '../thermo/constants';
import { ThermoRangeError } from '../thermo/errors';
import {
  constantKProperties as constantKPropertiesImported,
  isentropicFromPolytropic as isentropicFromPolytropicImported,
  newStageState,
  stagePressureRatio as stagePressureRatioImported,
} from './compression';
import {
  maxDischargeK as maxDischargeKImported,
  runTrain as runTrainImported,
  type Method,
  type TrainCase,
} from './compressor-train';
import { lineCurrentA } from './electrical';
import { selectMotor } from './motor-ratings';
import { EosError } from '../thermo/eos/eos-error';
import type { RealFluid } from './real-gas/fluid';
import { realMaxDischargeK, runRealGasTrain, type StageEfficiency } from './real-gas/train';
import type { CompressorBlock, MotorDrive } from './result-types';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const constantKProperties = constantKPropertiesImported;
const isentropicFromPolytropic = isentropicFromPolytropicImported;
const stagePressureRatio = stagePressureRatioImported;
const maxDischargeK = maxDischargeKImported;
const runTrain = runTrainImported;
const KELVIN_OFFSET = ZERO_CELSIUS_K;

export const MAX_STAGES = 6;
/** Default discharge-temperature limit, K: 150 °C for reciprocating process compressors [mem: API 618, 5th ed.]. */
export const DEFAULT_DISCHARGE_LIMIT_K = ZERO_CELSIUS_K + 150;
/** Hydrogen-rich service: about 135 °C [mem: API 618, 5th ed.]; applied by default from 50 mol % H2 [cp]. */
export const HYDROGEN_DISCHARGE_LIMIT_K = ZERO_CELSIUS_K + 135;
/** Assumed when the user gives a supply but no motor data [cp: typical for IE3 motors of tens of kW]. */
export const DEFAULT_MOTOR_EFFICIENCY = 0.95;
export const DEFAULT_MOTOR_POWER_FACTOR = 0.85;

/** A compressor duty point in SI units, as `calculateCore` resolves it. */
export type CompressorCase = TrainCase & {
  /** The real-gas equation for the headline; null (or absent) when ideal gas was asked for. */
  fluid?: RealFluid | null;
  stages: number;
  isentropicEfficiency: number | null;
  polytropicEfficiency: number | null;
  method: Method;
  mechanicalEfficiency: number;
  dischargeLimitK: number;
  motorEfficiency: number | null;
  motorPowerFactor: number | null;
  supply: { voltageV: number; phases: 1 | 3 } | null;
};

const kScratch = newStageState();

/** Isentropic efficiency for N stages: as given, or converted from polytropic at the suction k. */
export function stageIsentropicEfficiency(c: CompressorCase, stages: number): number {
  if (c.isentropicEfficiency !== null) return c.isentropicEfficiency;
  const ratio = stagePressureRatio(stages, c.suctionPressurePa, c.dischargePressurePa, c.interstageDropFraction);
  constantKProperties(c.gas, c.suctionTemperatureK, c.kOverride, c.cpOverride, kScratch);
  return isentropicFromPolytropic(c.polytropicEfficiency ?? 1, ratio, kScratch.k);
}

function realEfficiency(c: CompressorCase): StageEfficiency {
  return c.isentropicEfficiency !== null
    ? { isentropic: c.isentropicEfficiency, polytropic: null }
    : { isentropic: null, polytropic: c.polytropicEfficiency ?? 1 };
}

/** Fewest stages (1-6) keeping every stage discharge at or below the limit, by the headline method; null if none. */
export function suggestStages(c: CompressorCase): number | null {
  for (let n = 1; n <= MAX_STAGES; n++) {
    try {
      const maxK = c.fluid
        ? realMaxDischargeK(c, c.fluid, n, realEfficiency(c))
        : maxDischargeK(c, c.method, n, stageIsentropicEfficiency(c, n));
      if (maxK <= c.dischargeLimitK) return n;
    } catch (err) {
      if (!(err instanceof ThermoRangeError) && !(err instanceof EosError)) throw err;
    }
  }
  return null;
}

function drive(c: CompressorCase, shaftPowerKw: number): MotorDrive | null {
  if (!c.supply) return null;
  const motorEfficiency = c.motorEfficiency ?? DEFAULT_MOTOR_EFFICIENCY;
  const powerFactor = c.motorPowerFactor ?? DEFAULT_MOTOR_POWER_FACTOR;
  const inputPowerKw = shaftPowerKw / motorEfficiency;
  return {
    motorEfficiency,
    powerFactor,
    inputPowerKw,
    voltageV: c.supply.voltageV,
    phases: c.supply.phases,
    lineCurrentA: lineCurrentA(inputPowerKw, c.supply.voltageV, c.supply.phases, powerFactor),
  };
}

/** Sizes a multistage adiabatic compressor by both methods; the headline follows `c.method`. */
export function sizeCompressor(c: CompressorCase): CompressorBlock {
  const eta = stageIsentropicEfficiency(c, c.stages);
  const constantK = runTrain(c, 'constant-k', c.stages, eta);
  const variableCp = runTrain(c, 'variable-cp', c.stages, eta);
  const realGas = c.fluid ? runRealGasTrain(c, c.fluid, c.stages, realEfficiency(c)) : null;
  const headline = realGas ?? (c.method === 'constant-k' ? constantK : variableCp);
  const shaftPowerKw = headline.gasPowerKw / c.mechanicalEfficiency;
  const driveResult = drive(c, shaftPowerKw);
  const last = headline.stages[headline.stages.length - 1]!;
  const lastDischargeK = last.dischargeTemperatureC + KELVIN_OFFSET;
  return {
    basis: realGas ? 'real-gas' : c.method,
    suctionPressureKpa: c.suctionPressurePa / 1000,
    dischargePressureKpa: c.dischargePressurePa / 1000,
    overallPressureRatio: c.dischargePressurePa / c.suctionPressurePa,
    stageCount: c.stages,
    stagePressureRatio: last.pressureRatio,
    interstagePressureDropPercent: c.interstageDropFraction * 100,
    intercoolerOutletTemperatureC: c.intercoolerOutletTemperatureK - KELVIN_OFFSET,
    isentropicEfficiency: eta,
    polytropicEfficiency: c.polytropicEfficiency,
    constantK,
    variableCp,
    realGas,
    methodDifferencePercent: ((constantK.gasPowerKw - variableCp.gasPowerKw) / variableCp.gasPowerKw) * 100,
    idealGasDifferencePercent: realGas
      ? ((variableCp.gasPowerKw - realGas.gasPowerKw) / realGas.gasPowerKw) * 100
      : null,
    gasPowerKw: headline.gasPowerKw,
    mechanicalEfficiency: c.mechanicalEfficiency,
    shaftPowerKw,
    motor: selectMotor(shaftPowerKw),
    drive: driveResult,
    motorInputPowerKw: driveResult?.inputPowerKw ?? null,
    lineCurrentA: driveResult?.lineCurrentA ?? null,
    dischargeTemperatureLimitC: c.dischargeLimitK - KELVIN_OFFSET,
    suggestedStages: suggestStages(c),
    dischargeActualFlowM3PerH:
      (3600 * c.massFlowKgPerS * c.gas.gasConstantJPerKgK * lastDischargeK) / c.dischargePressurePa,
  };
}

import { MAX_TEMPERATURE_K } from '../thermo/constants';
import { ThermoRangeError } from '../thermo/errors';
import type { GasModel } from '../thermo/gas-model';
import {
  temperatureFromEnthalpy as temperatureFromEnthalpyImported,
  temperatureFromEntropy as temperatureFromEntropyImported,
} from '../thermo/inversion';
import {
  cpMass as cpMassImported,
  enthalpyMass as enthalpyMassImported,
  standardEntropyMass as standardEntropyMassImported,
} from '../thermo/properties';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const temperatureFromEnthalpy = temperatureFromEnthalpyImported;
const temperatureFromEntropy = temperatureFromEntropyImported;
const cpMass = cpMassImported;
const enthalpyMass = enthalpyMassImported;
const standardEntropyMass = standardEntropyMassImported;
const T_MAX = MAX_TEMPERATURE_K;

/** One adiabatic stage; filled in place so that trains and stage-count searches allocate nothing. */
export type StageState = {
  isentropicDischargeK: number;
  dischargeK: number;
  workJPerKg: number;
  k: number;
  cpJPerKgK: number;
};

/** A zeroed stage state to fill in place. */
export function newStageState(): StageState {
  return { isentropicDischargeK: 0, dischargeK: 0, workJPerKg: 0, k: 0, cpJPerKgK: 0 };
}

/**
 * k and cp for the constant-k method at a stage inlet: the user's overrides, else the gas data at that
 * temperature. With only one override the other follows from cp - cv = R.
 */
export function constantKProperties(
  gas: GasModel,
  inletK: number,
  kOverride: number | null,
  cpOverride: number | null,
  out: StageState,
): void {
  const r = gas.gasConstantJPerKgK;
  if (kOverride !== null && cpOverride !== null) {
    out.k = kOverride;
    out.cpJPerKgK = cpOverride;
  } else if (kOverride !== null) {
    out.k = kOverride;
    out.cpJPerKgK = (r * kOverride) / (kOverride - 1);
  } else if (cpOverride !== null) {
    out.cpJPerKgK = cpOverride;
    out.k = cpOverride / (cpOverride - r);
  } else {
    const cp = cpMass(gas, inletK);
    out.cpJPerKgK = cp;
    out.k = cp / (cp - r);
  }
}

/**
 * Constant k: T2s = T1 r^((k-1)/k); T2 = T1 + (T2s - T1)/eta; w = cp (T2 - T1).
 * `out.k`/`out.cpJPerKgK` must be set first (constantKProperties).
 */
export function constantKStage(inletK: number, ratio: number, eta: number, out: StageState): void {
  const t2s = inletK * Math.pow(ratio, (out.k - 1) / out.k);
  const t2 = inletK + (t2s - inletK) / eta;
  if (!(t2 <= T_MAX)) throw new ThermoRangeError(t2);
  out.isentropicDischargeK = t2s;
  out.dischargeK = t2;
  out.workJPerKg = out.cpJPerKgK * (t2 - inletK);
}

/**
 * Variable cp: s°(T2s) = s°(T1) + R ln r; h2 = h1 + (h(T2s) - h1)/eta; T2 from h2. Both inversions start
 * from the constant-k estimate at the inlet, so Newton converges in a few steps.
 */
export function variableCpStage(gas: GasModel, inletK: number, ratio: number, eta: number, out: StageState): void {
  const cp1 = cpMass(gas, inletK);
  const h1 = enthalpyMass(gas, inletK);
  const ds = gas.gasConstantJPerKgK * Math.log(ratio);
  const t2s = temperatureFromEntropy(gas, standardEntropyMass(gas, inletK) + ds, inletK * Math.exp(ds / cp1));
  const h2 = h1 + (enthalpyMass(gas, t2s) - h1) / eta;
  out.isentropicDischargeK = t2s;
  out.dischargeK = temperatureFromEnthalpy(gas, h2, inletK + (t2s - inletK) / eta);
  out.workJPerKg = h2 - h1;
  out.cpJPerKgK = cp1;
  out.k = cp1 / (cp1 - gas.gasConstantJPerKgK);
}

/**
 * Isentropic efficiency equivalent to a polytropic one for a stage of ratio r:
 * eta_s = (r^((k-1)/k) - 1) / (r^((k-1)/(k eta_p)) - 1) [calc; method as in standard gas-turbine texts].
 */
export function isentropicFromPolytropic(polytropicEfficiency: number, ratio: number, k: number): number {
  const m = (k - 1) / k;
  return (Math.pow(ratio, m) - 1) / (Math.pow(ratio, m / polytropicEfficiency) - 1);
}

/** Equal pressure ratio per stage with a fractional pressure drop at each of the N-1 intercoolers. */
export function stagePressureRatio(
  stages: number,
  suctionPa: number,
  dischargePa: number,
  dropFraction: number,
): number {
  return Math.pow(dischargePa / (suctionPa * Math.pow(1 - dropFraction, stages - 1)), 1 / stages);
}

import {
  CRITICAL_REDUCED_DENSITY,
  fractionsOf,
  prepareComposition,
  type PengRobinsonComponents,
  type PengRobinsonOptions,
  type SpeciesFractions,
} from '../eos/peng-robinson';
import { R } from '../eos/peng-robinson/constants';
import { requirePositive } from '../eos/peng-robinson/errors';
import { dewPressure, dewTemperature, type SaturationPoint } from './saturation';
import { stabilityTest } from './stability';
import { pureSaturation, pureSaturationTemperature } from './vapour-pressure';
import { wilsonDewPressure, wilsonDewTemperature, wilsonLnK } from './wilson';

/** A dew point as reported to callers: where, and the composition of the first drop. */
export type DewPoint = { temperatureK: number; pressurePa: number; firstDrop: Record<string, number> };

/** Why no number is given: near the critical region the iteration cannot be trusted; or there is no dew point. */
export type NoDewPoint = { reason: 'near-critical' | 'none' };

function wilsonStart(sys: PengRobinsonComponents, z: ArrayLike<number>, T: number, p: number): Float64Array {
  const lnK = wilsonLnK(sys, T, p, new Float64Array(sys.n));
  let s = 0;
  for (let i = 0; i < sys.n; i++) s += z[i]! * Math.exp(-lnK[i]!);
  for (let i = 0; i < sys.n; i++) lnK[i] = (z[i]! * Math.exp(-lnK[i]!)) / s;
  return lnK;
}

/** The incipient phase must be the denser one for a dew point (else it is a bubble point or the same phase). */
function isDew(r: SaturationPoint): boolean {
  return r.ok && r.zIncipient < r.zFeed * (1 - 1e-6);
}

/**
 * Ordinary dew temperature of z at p (the one met when the gas is cooled at constant pressure), from Wilson's
 * estimate. A result on the retrograde branch, a trivial solution or no convergence is reported as
 * 'near-critical'; above the cricondenbar there is nothing to find, which also ends there.
 */
export function dewTemperatureOf(sys: PengRobinsonComponents, z: ArrayLike<number>, p: number): DewPoint | NoDewPoint {
  if (sys.n === 1) {
    const T = pureSaturationTemperature(sys, p);
    return T === null ? { reason: 'none' } : { temperatureK: T, pressurePa: p, firstDrop: fractionsOf(sys.ids, [1]) };
  }
  const T0 = wilsonDewTemperature(sys, z, p);
  const r = dewTemperature(sys, z, p, T0, wilsonStart(sys, z, T0, p));
  if (!r.ok || !isDew(r) || !(r.slope < 0)) return { reason: 'near-critical' };
  return { temperatureK: r.temperatureK, pressurePa: p, firstDrop: fractionsOf(sys.ids, r.incipient) };
}

/**
 * The fallback where the dew iteration cannot be trusted (near the cricondenbar or cricondentherm): cools the feed
 * from T (where it is stable) at constant p in 4 % steps with the stability test, then bisects the first unstable
 * step to 0.05 K. Returns the highest dew temperature below T, or null when the feed stays one phase until it is
 * clearly liquid-like (1.5 times the critical b rho) or reaches 0.4 T: above the cricondenbar it cannot condense
 * on cooling, it only grows denser.
 */
export function dewTemperatureByStability(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  p: number,
  T: number,
): number | null {
  let b = 0;
  for (let i = 0; i < sys.n; i++) b += z[i]! * sys.b[i]!;
  const denseZ = (b * p) / (1.5 * CRITICAL_REDUCED_DENSITY * R); // Z * T below which b rho > 1.5 b rho_c
  let stableT = T;
  let unstableT = NaN;
  for (let t = T * 0.96; t >= 0.4 * T; t *= 0.96) {
    const s = stabilityTest(sys, z, t, p);
    if (!s.stable) {
      unstableT = t;
      break;
    }
    stableT = t;
    if (s.feedZ * t < denseZ) return null;
  }
  if (!Number.isFinite(unstableT)) return null;
  while (stableT - unstableT > 0.05) {
    const mid = 0.5 * (stableT + unstableT);
    if (stabilityTest(sys, z, mid, p).stable) stableT = mid;
    else unstableT = mid;
  }
  return 0.5 * (stableT + unstableT);
}

/** Ordinary (lower) dew pressure of z at T from Wilson's estimate; see `dewTemperatureOf`. */
export function lowerDewPressureOf(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  T: number,
): DewPoint | NoDewPoint {
  if (sys.n === 1) {
    const s = pureSaturation(sys, T);
    return s ? { temperatureK: T, pressurePa: s.pressurePa, firstDrop: fractionsOf(sys.ids, [1]) } : { reason: 'none' };
  }
  const p0 = wilsonDewPressure(sys, z, T);
  const r = dewPressure(sys, z, T, p0, wilsonStart(sys, z, T, p0));
  if (!r.ok || !isDew(r) || !(r.slope > 0)) return { reason: 'near-critical' };
  return { temperatureK: T, pressurePa: r.pressurePa, firstDrop: fractionsOf(sys.ids, r.incipient) };
}

/**
 * Upper (retrograde) dew pressure of z at T, above `lowerPa`: marches up in pressure with the stability test until
 * the feed is stable again, narrows the step by bisection, then converges the dew equation from the last unstable
 * trial phase. Null when the feed turns stable without a retrograde dew point being found (the upper boundary is
 * a bubble point, or the march left the two-phase region at once).
 */
export function upperDewPressureOf(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  T: number,
  lowerPa: number,
): DewPoint | NoDewPoint {
  let pIn = lowerPa * 1.02;
  let inside = stabilityTest(sys, z, T, pIn);
  if (inside.stable) return { reason: 'none' };
  let pOut = NaN;
  for (let p = pIn * 1.25; p < 1e8; p *= 1.25) {
    const s = stabilityTest(sys, z, T, p);
    if (s.stable) {
      pOut = p;
      break;
    }
    pIn = p;
    inside = s;
  }
  if (!Number.isFinite(pOut)) return { reason: 'none' };
  for (let k = 0; k < 8; k++) {
    const mid = Math.sqrt(pIn * pOut);
    const s = stabilityTest(sys, z, T, mid);
    if (s.stable) pOut = mid;
    else {
      pIn = mid;
      inside = s;
    }
  }
  const trial = inside.trial!;
  const r = dewPressure(sys, z, T, pIn, trial);
  if (!r.ok) return { reason: 'near-critical' };
  if (!isDew(r) || !(r.slope < 0)) return { reason: 'none' };
  return { temperatureK: T, pressurePa: r.pressurePa, firstDrop: fractionsOf(sys.ids, r.incipient) };
}

/**
 * Whether the feed splits at any pressure from 1 bar to 1000 bar at T (stability tests 1.5× apart): when the dew
 * iteration fails, this tells "no dew point at this temperature" (above the cricondentherm) from "near-critical".
 */
function twoPhaseAnywhere(sys: PengRobinsonComponents, z: ArrayLike<number>, T: number): boolean {
  for (let p = 1e5; p <= 1e8; p *= 1.5) if (!stabilityTest(sys, z, T, p).stable) return true;
  return false;
}

/** Dew temperature at pressure p (Pa) of a gas given as mole fractions by species id. */
export function dewPointTemperature(
  moleFractions: SpeciesFractions,
  pressurePa: number,
  options?: PengRobinsonOptions,
): DewPoint | NoDewPoint {
  requirePositive('pressurePa', pressurePa, 'Pa');
  const { sys, x } = prepareComposition(moleFractions, options);
  return dewTemperatureOf(sys, x, pressurePa);
}

/** Dew pressures at T (K): the ordinary (lower) one and, for a retrograde gas, the upper one. */
export function dewPointPressures(
  moleFractions: SpeciesFractions,
  temperatureK: number,
  options?: PengRobinsonOptions,
): { lower: DewPoint | NoDewPoint; upper: DewPoint | NoDewPoint } {
  requirePositive('temperatureK', temperatureK, 'K');
  const { sys, x } = prepareComposition(moleFractions, options);
  let lower = lowerDewPressureOf(sys, x, temperatureK);
  if (!('pressurePa' in lower) && sys.n > 1 && !twoPhaseAnywhere(sys, x, temperatureK)) lower = { reason: 'none' };
  if (!('pressurePa' in lower) || sys.n === 1) return { lower, upper: { reason: 'none' } };
  return { lower, upper: upperDewPressureOf(sys, x, temperatureK, lower.pressurePa) };
}

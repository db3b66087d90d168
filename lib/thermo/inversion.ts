import { MAX_TEMPERATURE_K, MID_TEMPERATURE_K, MIN_TEMPERATURE_K } from './constants';
import { ThermoRangeError } from './errors';
import type { GasModel, RangePolynomial } from './gas-model';

// Newton steps kept inside a shrinking bracket (bisection when a step leaves it). h(T) and s°(T) are
// strictly increasing because cp > 0 everywhere in the data range, so the root is unique. The
// polynomials are evaluated inline (no range re-checks, one branch per step): this is the innermost loop
// of every compressor stage. Module-local copies because imported constants are getters under tsx.
const T_MIN = MIN_TEMPERATURE_K;
const T_MAX = MAX_TEMPERATURE_K;
const T_MID = MID_TEMPERATURE_K;
// Newton converges quadratically here (|f''/2f'| is about 1e-3 per K for both h and s°), so once a Newton
// step is below 1e-3 K the new estimate is within about 1e-9 K: accept it. Bisection steps only stop on a
// bracket narrower than 1e-9 K.
const NEWTON_STEP_TOLERANCE_K = 1e-3;
const BRACKET_TOLERANCE_K = 1e-9;
const MAX_ITERATIONS = 80;
// Horner evaluation is not monotonic to the last bit: h(5999.999999999997 K) can exceed h(6000 K) by one
// ulp. Targets within this relative slack of the range ends are accepted (they invert to the end point).
const ROUNDING_SLACK = 1e-12;

function outOfRange(below: boolean, property: string): ThermoRangeError {
  const side = below ? `below ${T_MIN} K` : `above ${T_MAX} K`;
  return new ThermoRangeError(
    below ? -Infinity : Infinity,
    `the ${property} asked for lies at a temperature ${side}, outside the range of the property data`,
  );
}

function cpOf(p: RangePolynomial, t: number): number {
  return p.c0 + t * (p.c1 + t * (p.c2 + t * (p.c3 + t * p.c4)));
}

/** Temperature (K) at which the specific enthalpy equals `enthalpyJPerKg`. */
export function temperatureFromEnthalpy(gas: GasModel, enthalpyJPerKg: number, guessK = 1000): number {
  const slack = ROUNDING_SLACK * (Math.abs(gas.hMinJPerKg) + Math.abs(gas.hMaxJPerKg));
  if (!(enthalpyJPerKg >= gas.hMinJPerKg - slack && enthalpyJPerKg <= gas.hMaxJPerKg + slack)) {
    throw outOfRange(enthalpyJPerKg < gas.hMinJPerKg, 'enthalpy');
  }
  let lo = T_MIN;
  let hi = T_MAX;
  let t = guessK >= T_MIN && guessK <= T_MAX ? guessK : T_MID;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const p = t < T_MID ? gas.low : gas.high;
    const f = p.h6 + t * (p.h1 + t * (p.h2 + t * (p.h3 + t * (p.h4 + t * p.h5)))) - enthalpyJPerKg;
    if (f > 0) hi = t;
    else lo = t;
    const next = t - f / cpOf(p, t);
    if (next > lo && next < hi) {
      if (Math.abs(next - t) < NEWTON_STEP_TOLERANCE_K) return next;
      t = next;
    } else {
      t = 0.5 * (lo + hi);
      if (hi - lo < BRACKET_TOLERANCE_K) return t;
    }
  }
  return t;
}

/** Temperature (K) at which the standard-state entropy equals `entropyJPerKgK`. */
export function temperatureFromEntropy(gas: GasModel, entropyJPerKgK: number, guessK = 1000): number {
  const slack = ROUNDING_SLACK * (Math.abs(gas.sMinJPerKgK) + Math.abs(gas.sMaxJPerKgK));
  if (!(entropyJPerKgK >= gas.sMinJPerKgK - slack && entropyJPerKgK <= gas.sMaxJPerKgK + slack)) {
    throw outOfRange(entropyJPerKgK < gas.sMinJPerKgK, 'entropy');
  }
  let lo = T_MIN;
  let hi = T_MAX;
  let t = guessK >= T_MIN && guessK <= T_MAX ? guessK : T_MID;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const p = t < T_MID ? gas.low : gas.high;
    const f = p.c0 * Math.log(t) + p.s7 + t * (p.s2 + t * (p.s3 + t * (p.s4 + t * p.s5))) - entropyJPerKgK;
    if (f > 0) hi = t;
    else lo = t;
    // ds°/dT = cp/T
    const next = t - (f * t) / cpOf(p, t);
    if (next > lo && next < hi) {
      if (Math.abs(next - t) < NEWTON_STEP_TOLERANCE_K) return next;
      t = next;
    } else {
      t = 0.5 * (lo + hi);
      if (hi - lo < BRACKET_TOLERANCE_K) return t;
    }
  }
  return t;
}

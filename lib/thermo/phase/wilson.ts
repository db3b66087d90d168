import type { PengRobinsonComponents } from '../eos/peng-robinson';

/*
 * Wilson's K-value estimate K_i = (pc_i / p) exp[5.373 (1 + ω_i)(1 - Tc_i / T)] [pub: G. M. Wilson, "A modified
 * Redlich-Kwong equation of state, application to general physical data calculations", AIChE 65th National
 * Meeting, Cleveland (1969), paper 15C; as used by Michelsen, Fluid Phase Equilib. 9 (1982) 21-40]: the start
 * of every phase-split iteration here. For a pure fluid it is the Lee-Kesler-style vapour-pressure estimate.
 */

const W = 5.373;

/** ln K_i at (T, p) into `out`. */
export function wilsonLnK(sys: PengRobinsonComponents, T: number, p: number, out: Float64Array): Float64Array {
  for (let i = 0; i < sys.n; i++) {
    out[i] = Math.log(sys.pcPa[i]! / p) + W * (1 + sys.omega[i]!) * (1 - sys.tcK[i]! / T);
  }
  return out;
}

/** Wilson's estimate of the vapour pressure of component i at T, Pa. */
export function wilsonVapourPressure(sys: PengRobinsonComponents, i: number, T: number): number {
  return sys.pcPa[i]! * Math.exp(W * (1 + sys.omega[i]!) * (1 - sys.tcK[i]! / T));
}

/** Dew pressure of z at T with Wilson K-values (Σ z_i / K_i = 1 solved exactly: K ∝ 1/p), Pa. */
export function wilsonDewPressure(sys: PengRobinsonComponents, z: ArrayLike<number>, T: number): number {
  let s = 0;
  for (let i = 0; i < sys.n; i++) s += z[i]! / wilsonVapourPressure(sys, i, T);
  return 1 / s;
}

/**
 * Dew temperature of z at p with Wilson K-values: f(u) = ln Σ z_i / K_i(1/u) is a log-sum-exp of functions
 * linear in u = 1/T, hence convex and increasing, so Newton from the low-temperature side converges monotonically.
 */
export function wilsonDewTemperature(sys: PengRobinsonComponents, z: ArrayLike<number>, p: number): number {
  let u = 1 / 20; // 20 K: below every dew point that matters, f > 0 there
  for (let iter = 0; iter < 100; iter++) {
    let s = 0;
    let ds = 0;
    for (let i = 0; i < sys.n; i++) {
      const c = W * (1 + sys.omega[i]!);
      const t = (z[i]! * p * Math.exp(-c * (1 - sys.tcK[i]! * u))) / sys.pcPa[i]!;
      s += t;
      ds += t * c * sys.tcK[i]!;
    }
    const step = Math.log(s) / (ds / s);
    u -= step;
    if (Math.abs(step) < 1e-12 * u) break;
  }
  return 1 / u;
}

import {
  CRITICAL_REDUCED_DENSITY,
  lnPhiOfRoot,
  newCubicRoots,
  solveCubic,
  type PengRobinsonComponents,
} from '../eos/peng-robinson';
import { DELTA_1, DELTA_2, R, SQRT2 } from '../eos/peng-robinson/constants';
import { wilsonVapourPressure } from './wilson';

const roots = newCubicRoots();

/** Saturation state of a pure fluid from Peng-Robinson. */
export type PureSaturation = { pressurePa: number; zLiquid: number; zVapour: number };

function reduced(sys: PengRobinsonComponents, T: number, p: number): [number, number] {
  sys.setTemperature(T);
  const RT = R * T;
  return [(sys.a[0]! * p) / (RT * RT), (sys.b[0]! * p) / RT];
}

/**
 * Vapour pressure of the single component of `sys` at T by equal fugacity of the liquid and vapour roots:
 * Newton on ln p with d(ln φ_L - ln φ_V)/d ln p = Z_L - Z_V, started from Wilson's estimate and kept inside a
 * bracket. Where the cubic has one root, its density tells the side: liquid-like (above the critical density)
 * means p is above the vapour spinodal, so too high; vapour-like means too low. Null at or above Tc.
 */
export function pureSaturation(sys: PengRobinsonComponents, T: number): PureSaturation | null {
  if (!(T < sys.tcK[0]!)) return null;
  let p = Math.min(wilsonVapourPressure(sys, 0, T), 0.999 * sys.pcPa[0]!);
  let lo = 0;
  let hi = sys.pcPa[0]!;
  for (let iter = 0; iter < 200; iter++) {
    const [A, B] = reduced(sys, T, p);
    solveCubic(A, B, roots);
    let next: number;
    if (roots.count === 1) {
      if (B / roots.zVapour > CRITICAL_REDUCED_DENSITY) hi = p;
      else lo = p;
      next = lo > 0 ? Math.sqrt(lo * hi) : hi * 1e-3;
    } else {
      const g = lnPhiOfRoot(roots.zLiquid, A, B) - lnPhiOfRoot(roots.zVapour, A, B);
      if (Math.abs(g) < 1e-13) return { pressurePa: p, zLiquid: roots.zLiquid, zVapour: roots.zVapour };
      if (g > 0) lo = p;
      else hi = p;
      next = p * Math.exp(g / (roots.zVapour - roots.zLiquid));
      if (!(next > lo && next < hi)) next = lo > 0 ? Math.sqrt(lo * hi) : hi * 1e-3;
    }
    if (hi - lo <= 1e-14 * hi) return null;
    p = next;
  }
  return null;
}

/** Residual enthalpy of a pure-fluid root, divided by R T. */
function residualEnthalpy(sys: PengRobinsonComponents, T: number, z: number, A: number, B: number): number {
  const dadT = 2 * sys.sqrtAc[0]! * sys.sqrtAc[0]! * sys.m[0]! * sys.dm[0]!;
  const L = Math.log((z + DELTA_1 * B) / (z + DELTA_2 * B));
  return z - 1 + ((A / B) * ((T * dadT) / sys.a[0]! - 1) * L) / (2 * SQRT2);
}

/**
 * Saturation temperature of the single component at p (K), or null at or above pc: Newton on u = 1/T with the
 * exact Clapeyron slope d ln p_sat / du = -(h_V - h_L) / (R (Z_V - Z_L)) from the equation's own enthalpies.
 */
export function pureSaturationTemperature(sys: PengRobinsonComponents, p: number): number | null {
  const tc = sys.tcK[0]!;
  if (!(p < sys.pcPa[0]!)) return null;
  const c = 5.373 * (1 + sys.omega[0]!);
  let T = Math.min(tc / (1 - Math.log(p / sys.pcPa[0]!) / c), 0.9999 * tc);
  for (let iter = 0; iter < 50; iter++) {
    const sat = pureSaturation(sys, T);
    if (!sat) {
      T = 0.5 * (T + 0.9 * tc);
      continue;
    }
    const f = Math.log(sat.pressurePa / p);
    if (Math.abs(f) < 1e-11) return T;
    const [A, B] = reduced(sys, T, sat.pressurePa);
    const dh = residualEnthalpy(sys, T, sat.zVapour, A, B) - residualEnthalpy(sys, T, sat.zLiquid, A, B);
    const slope = (-dh * T) / (sat.zVapour - sat.zLiquid); // d ln p / du with dh in units of R T
    let u = 1 / T - f / slope;
    u = Math.min(Math.max(u, 1 / (0.99999 * tc)), 1.2 / T);
    T = 1 / u;
  }
  return null;
}

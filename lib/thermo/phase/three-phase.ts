import { lnFugacityCoefficients, newFugacityState, type PengRobinsonComponents } from '../eos/peng-robinson';

/** A vapour-liquid-liquid split: vapour fraction and the two liquids (e.g. hydrocarbon condensate and water). */
export type ThreePhaseResult = {
  vapourFraction: number;
  liquidFractions: [number, number];
  vapour: Float64Array;
  liquids: [Float64Array, Float64Array];
  zVapour: number;
  zLiquids: [number, number];
  converged: boolean;
};

/**
 * Phase fractions for fixed K-values K1 = y/x1, K2 = y/x2: with E_i = 1 + β1 (1/K1_i - 1) + β2 (1/K2_i - 1),
 * Σ z_i ln E_i is concave in (β1, β2) and its gradient is the pair of material-balance equations
 * Σ (x1_i - y_i) = Σ (x2_i - y_i) = 0, so Newton's method with step halving (to keep every E_i > 0) finds the
 * unique maximum [pub: M. L. Michelsen, "Calculation of multiphase equilibrium", Comput. Chem. Eng. 18 (1994)
 * 545-550, the convex formulation]. Returns false when it does not settle.
 */
function solveFractions(
  z: ArrayLike<number>,
  a: Float64Array,
  c: Float64Array,
  n: number,
  beta: Float64Array,
): boolean {
  for (let iter = 0; iter < 100; iter++) {
    let g1 = 0;
    let g2 = 0;
    let h11 = 0;
    let h12 = 0;
    let h22 = 0;
    for (let i = 0; i < n; i++) {
      const e = 1 + beta[0]! * a[i]! + beta[1]! * c[i]!;
      const u = a[i]! / e;
      const v = c[i]! / e;
      g1 += z[i]! * u;
      g2 += z[i]! * v;
      h11 += z[i]! * u * u;
      h12 += z[i]! * u * v;
      h22 += z[i]! * v * v;
    }
    const det = h11 * h22 - h12 * h12;
    if (!(det > 0)) return false;
    let d1 = (h22 * g1 - h12 * g2) / det;
    let d2 = (h11 * g2 - h12 * g1) / det;
    for (let k = 0; k < 60; k++) {
      let ok = true;
      for (let i = 0; i < n && ok; i++) ok = 1 + (beta[0]! + d1) * a[i]! + (beta[1]! + d2) * c[i]! > 0;
      if (ok) break;
      d1 /= 2;
      d2 /= 2;
    }
    beta[0] = beta[0]! + d1;
    beta[1] = beta[1]! + d2;
    if (Math.abs(d1) + Math.abs(d2) < 1e-14) return true;
  }
  return false;
}

/**
 * Vapour-liquid-liquid flash by successive substitution on ln K1 and ln K2 (liquid roots for the liquids, the
 * lower-Gibbs root for the vapour), started from compositions of the three phases (a two-phase split plus the
 * trial phase of a failed stability test).
 */
export function threePhaseFlash(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  T: number,
  p: number,
  start: { vapour: ArrayLike<number>; liquid1: ArrayLike<number>; liquid2: ArrayLike<number> },
): ThreePhaseResult {
  const n = sys.n;
  const lnK1 = new Float64Array(n);
  const lnK2 = new Float64Array(n);
  const a = new Float64Array(n);
  const c = new Float64Array(n);
  const y = new Float64Array(n);
  const x1 = new Float64Array(n);
  const x2 = new Float64Array(n);
  const fV = new Float64Array(n);
  const f1 = new Float64Array(n);
  const f2 = new Float64Array(n);
  const sV = newFugacityState();
  const s1 = newFugacityState();
  const s2 = newFugacityState();
  const beta = Float64Array.of(0.01, 0.01);
  for (let i = 0; i < n; i++) {
    lnK1[i] = Math.log(Math.max(start.vapour[i]!, 1e-300) / Math.max(start.liquid1[i]!, 1e-300));
    lnK2[i] = Math.log(Math.max(start.vapour[i]!, 1e-300) / Math.max(start.liquid2[i]!, 1e-300));
  }
  let converged = false;
  for (let iter = 0; iter < 500; iter++) {
    for (let i = 0; i < n; i++) {
      a[i] = Math.exp(-lnK1[i]!) - 1;
      c[i] = Math.exp(-lnK2[i]!) - 1;
    }
    if (!solveFractions(z, a, c, n, beta)) break;
    for (let i = 0; i < n; i++) {
      y[i] = z[i]! / (1 + beta[0]! * a[i]! + beta[1]! * c[i]!);
      x1[i] = y[i]! * Math.exp(-lnK1[i]!);
      x2[i] = y[i]! * Math.exp(-lnK2[i]!);
    }
    lnFugacityCoefficients(sys, T, p, y, 'stable', fV, sV);
    lnFugacityCoefficients(sys, T, p, x1, 'liquid', f1, s1);
    lnFugacityCoefficients(sys, T, p, x2, 'liquid', f2, s2);
    let err = 0;
    for (let i = 0; i < n; i++) {
      const k1 = f1[i]! - fV[i]!;
      const k2 = f2[i]! - fV[i]!;
      err += (k1 - lnK1[i]!) ** 2 + (k2 - lnK2[i]!) ** 2;
      lnK1[i] = k1;
      lnK2[i] = k2;
    }
    if (err < 1e-20) {
      converged = true;
      break;
    }
  }
  return {
    vapourFraction: 1 - beta[0]! - beta[1]!,
    liquidFractions: [beta[0]!, beta[1]!],
    vapour: y,
    liquids: [x1, x2],
    zVapour: sV.z,
    zLiquids: [s1.z, s2.z],
    converged,
  };
}

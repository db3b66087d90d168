import type { PengRobinsonComponents } from './components';
import { DELTA_1, DELTA_2, R, SQRT2 } from './constants';
import { newCubicRoots, pickRoot, solveCubic, type CubicRoots } from './cubic';

export type PhaseRoot = 'vapour' | 'liquid' | 'stable';

/** What the last `lnFugacityCoefficients` call found, for callers that need more than ln φ. */
export type FugacityState = {
  /** Compressibility factor of the chosen root. */
  z: number;
  /** A = a p / (R T)², B = b p / (R T). */
  A: number;
  B: number;
  /** Mixture co-volume b, m3/mol. */
  b: number;
  /** Number of physical roots (1 or 3). */
  rootCount: number;
};

const roots: CubicRoots = newCubicRoots();

/**
 * ln φ_i of every component of `sys` in a phase of composition x (mole fractions in `sys.ids` order, summing
 * to 1) at T (K), p (Pa), on the root chosen by `phase` [pub: Peng & Robinson 1976, eq. 19]:
 *   ln φ_i = (b_i/b)(Z - 1) - ln(Z - B) - A/(2√2 B) (2 Σ_j x_j a_ij / a - b_i/b) ln[(Z + (1+√2)B)/(Z + (1-√2)B)]
 * When `dLnPhiDLnP` is given it also receives ∂ln φ_i/∂ln p at fixed T and x, = p v̄_i/(R T) - 1, with the
 * partial molar volume v̄_i = -(∂p/∂n_i)_{T,V} / (∂p/∂V)_{T,n} of the cubic. Fills `state`; allocation-free.
 */
export function lnFugacityCoefficients(
  sys: PengRobinsonComponents,
  T: number,
  p: number,
  x: ArrayLike<number>,
  phase: PhaseRoot,
  out: Float64Array,
  state: FugacityState,
  dLnPhiDLnP?: Float64Array,
): void {
  sys.setTemperature(T);
  const n = sys.n;
  const aij = sys.aij;
  const bi = sys.b;
  const sumA = sys.sumA;
  let a = 0;
  let b = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    const row = i * n;
    for (let j = 0; j < n; j++) s += aij[row + j]! * x[j]!;
    sumA[i] = s;
    a += x[i]! * s;
    b += x[i]! * bi[i]!;
  }
  const RT = R * T;
  const A = (a * p) / (RT * RT);
  const B = (b * p) / RT;
  solveCubic(A, B, roots);
  const z = pickRoot(roots, A, B, phase);
  const lnZB = Math.log(z - B);
  const L = Math.log((z + DELTA_1 * B) / (z + DELTA_2 * B));
  const coef = A / (2 * SQRT2 * B);
  for (let i = 0; i < n; i++) {
    const bRatio = bi[i]! / b;
    out[i] = bRatio * (z - 1) - lnZB - coef * ((2 * sumA[i]!) / a - bRatio) * L;
  }
  state.z = z;
  state.A = A;
  state.B = B;
  state.b = b;
  state.rootCount = roots.count;
  if (dLnPhiDLnP) {
    const v = (z * RT) / p;
    const vb = v - b;
    const den = v * v + 2 * b * v - b * b;
    const dPdV = -RT / (vb * vb) + (2 * a * (v + b)) / (den * den);
    for (let i = 0; i < n; i++) {
      const dPdNi = RT / vb + (RT * bi[i]!) / (vb * vb) - (2 * sumA[i]!) / den + (2 * a * bi[i]! * vb) / (den * den);
      dLnPhiDLnP[i] = (p * (-dPdNi / dPdV)) / RT - 1;
    }
  }
}

export function newFugacityState(): FugacityState {
  return { z: NaN, A: NaN, B: NaN, b: NaN, rootCount: 0 };
}

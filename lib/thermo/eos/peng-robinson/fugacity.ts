import type { PengRobinsonComponents } from './components';
import { DELTA_1 as D1, DELTA_2 as D2, R as GAS_R, SQRT2 as S2 } from './constants';
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
// Module-local copies: under CommonJS transpilation (tsx scripts, the bench) every use of an imported constant is
// a getter call, which costs more than the arithmetic here.
const DELTA_1 = D1;
const DELTA_2 = D2;
const R = GAS_R;
const SQRT2 = S2;

/**
 * ln φ_i of every component of `sys` in a phase of composition x (mole fractions in `sys.ids` order, summing
 * to 1) at T (K), p (Pa), on the root chosen by `phase` [pub: Peng & Robinson 1976, eq. 19]:
 *   ln φ_i = (b_i/b)(Z - 1) - ln(Z - B) - A/(2√2 B) (2 Σ_j x_j a_ij / a - b_i/b) ln[(Z + (1+√2)B)/(Z + (1-√2)B)]
 * When `dLnPhiDLnP` is given it also receives ∂ln φ_i/∂ln p at fixed T and x, = p v̄_i/(R T) - 1, with the
 * partial molar volume v̄_i = -(∂p/∂n_i)_{T,V} / (∂p/∂V)_{T,n} of the cubic. When `dLnPhiDT` is given it receives
 * ∂ln φ_i/∂T at fixed p and x (1/K), differentiating the expression above with Z'(T) from the cubic F(Z, A, B) = 0:
 * Z' = -(F_A A' + F_B B') / F_Z, and a_ij' = a_ij (m_i'/m_i + m_j'/m_j). Fills `state`; allocation-free.
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
  dLnPhiDT?: Float64Array,
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
  if (dLnPhiDT) temperatureDerivative(sys, T, x, a, b, A, B, z, L, coef, dLnPhiDT);
}

function temperatureDerivative(
  sys: PengRobinsonComponents,
  T: number,
  x: ArrayLike<number>,
  a: number,
  b: number,
  A: number,
  B: number,
  z: number,
  L: number,
  coef: number,
  out: Float64Array,
): void {
  const n = sys.n;
  const aij = sys.aij;
  const m = sys.m;
  const dm = sys.dm;
  const sumA = sys.sumA;
  // Σ_j x_j a_ij' into out (temporarily), and a' = Σ_i x_i Σ_j x_j a_ij'.
  let da = 0;
  for (let i = 0; i < n; i++) {
    const ri = dm[i]! / m[i]!;
    let s = 0;
    const row = i * n;
    for (let j = 0; j < n; j++) s += aij[row + j]! * x[j]! * (ri + dm[j]! / m[j]!);
    out[i] = s;
    da += x[i]! * s;
  }
  const dA = A * (da / a - 2 / T);
  const dB = -B / T;
  const fZ = (3 * z - 2 * (1 - B)) * z + (A - 3 * B * B - 2 * B);
  const fA = z - B;
  const fB = z * z - (6 * B + 2) * z - (A - 2 * B - 3 * B * B);
  const dZ = -(fA * dA + fB * dB) / fZ;
  const dL = (dZ + DELTA_1 * dB) / (z + DELTA_1 * B) - (dZ + DELTA_2 * dB) / (z + DELTA_2 * B);
  const dLnZB = (dZ - dB) / (z - B);
  const dCoef = coef * (da / a - 1 / T); // coef = a / (2√2 b R T)
  for (let i = 0; i < n; i++) {
    const bRatio = sys.b[i]! / b;
    const g = (2 * sumA[i]!) / a - bRatio;
    const dg = (2 * out[i]!) / a - (2 * sumA[i]! * da) / (a * a);
    out[i] = bRatio * dZ - dLnZB - dCoef * g * L - coef * dg * L - coef * g * dL;
  }
}

export function newFugacityState(): FugacityState {
  return { z: NaN, A: NaN, B: NaN, b: NaN, rootCount: 0 };
}

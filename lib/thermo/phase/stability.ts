import { lnFugacityCoefficients, newFugacityState, type PengRobinsonComponents } from '../eos/peng-robinson';
import { wilsonLnK } from './wilson';

/** Outcome of the tangent-plane stability test of a feed at (T, p). */
export type StabilityResult = {
  stable: boolean;
  /** Lowest modified tangent-plane distance found (negative proves instability). */
  tm: number;
  /** Composition of the trial phase that proved instability (null when stable). */
  trial: Float64Array | null;
  /** Whether that trial started vapour-like (K z) or liquid-like (z / K). */
  trialKind: 'vapour-like' | 'liquid-like' | null;
  /** Z of the feed on its stable root. */
  feedZ: number;
};

/** Σ (ln W - ln z)² below this: the trial has fallen onto the feed (trivial solution). */
const TRIVIAL = 1e-6;
/**
 * Σ (Δ ln W)² below this ends a trial: the sign of tm is settled long before, except within a few millikelvin of the
 * phase boundary, where either answer is right for sizing (the dew margin is then zero to that accuracy).
 */
const CONVERGED = 1e-12;

/**
 * Michelsen's tangent-plane-distance test [pub: M. L. Michelsen, "The isothermal flash problem. Part I.
 * Stability", Fluid Phase Equilib. 9 (1982) 1-19]: with d_i = ln z_i + ln φ_i(z), successive substitution
 * ln W_i <- d_i - ln φ_i(w), w = W / ΣW, from a vapour-like (W = z K) and a liquid-like (W = z / K) Wilson start,
 * each on its lower-Gibbs-energy root; tm* = 1 + Σ W_i (ln W_i + ln φ_i(w) - d_i - 1) < 0 proves the feed
 * unstable. Every fifth step is extrapolated along the dominant eigenvalue of the iteration (Michelsen's GDEM,
 * same paper, sec. 5), which removes most of the slow convergence near the phase boundary.
 */
export function stabilityTest(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  T: number,
  p: number,
): StabilityResult {
  const n = sys.n;
  const state = newFugacityState();
  const lnPhi = new Float64Array(n);
  const d = new Float64Array(n);
  const lnK = wilsonLnK(sys, T, p, new Float64Array(n));
  const lnW = new Float64Array(n);
  const w = new Float64Array(n);
  const delta = new Float64Array(n);
  const previous = new Float64Array(n);
  lnFugacityCoefficients(sys, T, p, z, 'stable', lnPhi, state);
  const feedZ = state.z;
  for (let i = 0; i < n; i++) d[i] = Math.log(z[i]!) + lnPhi[i]!;
  let best: StabilityResult = { stable: true, tm: 0, trial: null, trialKind: null, feedZ };
  if (n === 1) return best; // a pure fluid is split by its vapour pressure, not by this test
  for (const kind of ['vapour-like', 'liquid-like'] as const) {
    const sign = kind === 'vapour-like' ? 1 : -1;
    for (let i = 0; i < n; i++) lnW[i] = Math.log(z[i]!) + sign * lnK[i]!;
    for (let iter = 1; iter <= 300; iter++) {
      let sumW = 0;
      for (let i = 0; i < n; i++) sumW += Math.exp(lnW[i]!);
      for (let i = 0; i < n; i++) w[i] = Math.exp(lnW[i]!) / sumW;
      lnFugacityCoefficients(sys, T, p, w, 'stable', lnPhi, state);
      let tm = 1;
      let err = 0;
      let trivial = 0;
      for (let i = 0; i < n; i++) {
        const W = Math.exp(lnW[i]!);
        tm += W * (lnW[i]! + lnPhi[i]! - d[i]! - 1);
        const next = d[i]! - lnPhi[i]!;
        previous[i] = delta[i]!;
        delta[i] = next - lnW[i]!;
        err += delta[i]! * delta[i]!;
        lnW[i] = next;
        const t = next - Math.log(z[i]!);
        trivial += t * t;
      }
      if (tm < -1e-8) {
        if (tm < best.tm) best = { stable: false, tm, trial: Float64Array.from(w), trialKind: kind, feedZ };
        break;
      }
      if (err < CONVERGED || trivial < TRIVIAL) break;
      if (iter % 5 === 0) accelerate(lnW, delta, previous, n);
    }
  }
  return best;
}

/** Michelsen's dominant-eigenvalue extrapolation of a linearly converging substitution. */
export function accelerate(x: Float64Array, delta: Float64Array, previous: Float64Array, n: number): void {
  let b01 = 0;
  let b11 = 0;
  for (let i = 0; i < n; i++) {
    b01 += delta[i]! * previous[i]!;
    b11 += previous[i]! * previous[i]!;
  }
  const lambda = b01 / b11;
  if (!(lambda > 0 && lambda < 0.98)) return;
  const factor = lambda / (1 - lambda);
  for (let i = 0; i < n; i++) x[i] = x[i]! + factor * delta[i]!;
}

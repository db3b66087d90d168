import { lnFugacityCoefficients, newFugacityState, type PengRobinsonComponents } from '../eos/peng-robinson';
import { rachfordRice } from './rachford-rice';
import { accelerate, type StabilityResult } from './stability';

/** A converged (or abandoned) two-phase split at (T, p). */
export type FlashResult = {
  /** Moles of vapour per mole of feed; outside (0, 1) when the iteration settled on one phase. */
  vapourFraction: number;
  /** Liquid (x) and vapour (y) mole fractions in component order. */
  liquid: Float64Array;
  vapour: Float64Array;
  zLiquid: number;
  zVapour: number;
  converged: boolean;
  iterations: number;
};

/**
 * Isothermal two-phase flash: Rachford-Rice for β at fixed K, then successive substitution
 * ln K_i <- ln φ_i^L(x) - ln φ_i^V(y), each phase on its lower-Gibbs-energy root, with the dominant-eigenvalue
 * extrapolation every fifth step [pub: Michelsen, "The isothermal flash problem. Part II. Phase-split
 * calculation", Fluid Phase Equilib. 9 (1982) 21-40]. Started from the K-values of the stability test's
 * unstable trial phase, so it needs an unstable `stability` result. The phase with the larger Z is reported as
 * the vapour.
 */
export function flash(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  T: number,
  p: number,
  stability: StabilityResult,
): FlashResult {
  const n = sys.n;
  const lnK = new Float64Array(n);
  const K = new Float64Array(n);
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const lnPhiL = new Float64Array(n);
  const lnPhiV = new Float64Array(n);
  const delta = new Float64Array(n);
  const previous = new Float64Array(n);
  const stateL = newFugacityState();
  const stateV = newFugacityState();
  const trial = stability.trial!;
  for (let i = 0; i < n; i++) {
    const r = Math.log(trial[i]! / z[i]!);
    lnK[i] = stability.trialKind === 'vapour-like' ? r : -r;
  }
  let beta = 0.5;
  let converged = false;
  let iter = 0;
  for (iter = 1; iter <= 500; iter++) {
    for (let i = 0; i < n; i++) K[i] = Math.exp(lnK[i]!);
    const b = rachfordRice(z, K, n, beta);
    if (!Number.isFinite(b)) break;
    beta = b;
    let sx = 0;
    let sy = 0;
    for (let i = 0; i < n; i++) {
      x[i] = z[i]! / (1 + beta * (K[i]! - 1));
      y[i] = K[i]! * x[i]!;
      sx += x[i]!;
      sy += y[i]!;
    }
    for (let i = 0; i < n; i++) {
      x[i] = x[i]! / sx;
      y[i] = y[i]! / sy;
    }
    lnFugacityCoefficients(sys, T, p, x, 'stable', lnPhiL, stateL);
    lnFugacityCoefficients(sys, T, p, y, 'stable', lnPhiV, stateV);
    let err = 0;
    let spread = 0;
    for (let i = 0; i < n; i++) {
      const next = lnPhiL[i]! - lnPhiV[i]!;
      previous[i] = delta[i]!;
      delta[i] = next - lnK[i]!;
      err += delta[i]! * delta[i]!;
      lnK[i] = next;
      spread += next * next;
    }
    if (err < 1e-22) {
      converged = true;
      break;
    }
    if (spread < 1e-10) break; // collapsed onto the trivial solution K = 1
    if (iter % 5 === 0) accelerate(lnK, delta, previous, n);
  }
  const swap = stateL.z > stateV.z;
  return {
    vapourFraction: swap ? 1 - beta : beta,
    liquid: swap ? y : x,
    vapour: swap ? x : y,
    zLiquid: swap ? stateV.z : stateL.z,
    zVapour: swap ? stateL.z : stateV.z,
    converged,
    iterations: iter,
  };
}

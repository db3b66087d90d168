import {
  lnFugacityCoefficients,
  newFugacityState,
  type FugacityState,
  type PengRobinsonComponents,
} from '../eos/peng-robinson';

/** A converged saturation (dew) point, or why there is none. */
export type SaturationPoint =
  | {
      ok: true;
      temperatureK: number;
      pressurePa: number;
      /** Composition of the incipient phase (the first drop of a dew point). */
      incipient: Float64Array;
      /** d ln(Σ W)/d ln p at fixed T (dew pressure) or d ln(Σ W)/dT at fixed p (dew temperature). */
      slope: number;
      zFeed: number;
      zIncipient: number;
      iterations: number;
    }
  | { ok: false; reason: 'trivial' | 'no-convergence' | 'out-of-range' };

type Work = {
  n: number;
  lnPhiZ: Float64Array;
  lnPhiW: Float64Array;
  dZ: Float64Array;
  dW: Float64Array;
  stateZ: FugacityState;
  stateW: FugacityState;
  w: Float64Array;
  lnZ: Float64Array;
  /** The last two changes of ln w, for the dominant-eigenvalue extrapolation. */
  delta: Float64Array;
  previous: Float64Array;
};

function work(sys: PengRobinsonComponents, z: ArrayLike<number>, w0: ArrayLike<number>): Work {
  const n = sys.n;
  const lnZ = new Float64Array(n);
  for (let i = 0; i < n; i++) lnZ[i] = Math.log(z[i]!);
  return {
    n,
    lnPhiZ: new Float64Array(n),
    lnPhiW: new Float64Array(n),
    dZ: new Float64Array(n),
    dW: new Float64Array(n),
    stateZ: newFugacityState(),
    stateW: newFugacityState(),
    w: Float64Array.from(w0),
    lnZ,
    delta: new Float64Array(n),
    previous: new Float64Array(n),
  };
}

/**
 * One substitution step at (T, p): W_i = z_i φ_i(z) / φ_i(w) with the feed on its vapour root and the incipient
 * phase w on its liquid root; w <- W / ΣW. Returns ln ΣW (0 at a dew point) and, through `change`, how far w
 * moved, how close it is to the feed (trivial solution) and the slope of ln ΣW in ln p or T at fixed compositions.
 */
function substitute(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  T: number,
  p: number,
  k: Work,
  slopeIn: 'pressure' | 'temperature',
  change: { step: number; trivial: number; slope: number },
): number {
  const inP = slopeIn === 'pressure';
  lnFugacityCoefficients(sys, T, p, z, 'vapour', k.lnPhiZ, k.stateZ, inP ? k.dZ : undefined, inP ? undefined : k.dZ);
  lnFugacityCoefficients(sys, T, p, k.w, 'liquid', k.lnPhiW, k.stateW, inP ? k.dW : undefined, inP ? undefined : k.dW);
  let s = 0;
  for (let i = 0; i < k.n; i++) s += Math.exp(k.lnZ[i]! + k.lnPhiZ[i]! - k.lnPhiW[i]!);
  let step = 0;
  let trivial = 0;
  let slope = 0;
  for (let i = 0; i < k.n; i++) {
    const next = Math.exp(k.lnZ[i]! + k.lnPhiZ[i]! - k.lnPhiW[i]!) / s;
    slope += next * (k.dZ[i]! - k.dW[i]!);
    const d = Math.log(next / k.w[i]!);
    step += d * d;
    k.previous[i] = k.delta[i]!;
    k.delta[i] = d;
    const t = Math.log(next) - k.lnZ[i]!;
    trivial += t * t;
    k.w[i] = next;
  }
  change.step = step;
  change.trivial = trivial;
  change.slope = slope;
  return Math.log(s);
}

/**
 * Every fifth step, extrapolates ln w along its dominant eigenvalue (as in the stability test), which cuts the
 * substitution's slow tail near the cricondenbar and cricondentherm.
 */
function extrapolate(k: Work): void {
  let b01 = 0;
  let b11 = 0;
  for (let i = 0; i < k.n; i++) {
    b01 += k.delta[i]! * k.previous[i]!;
    b11 += k.previous[i]! * k.previous[i]!;
  }
  const lambda = b01 / b11;
  if (!(lambda > 0 && lambda < 0.98)) return;
  const factor = lambda / (1 - lambda);
  let s = 0;
  for (let i = 0; i < k.n; i++) {
    k.w[i] = k.w[i]! * Math.exp(factor * k.delta[i]!);
    s += k.w[i]!;
  }
  for (let i = 0; i < k.n; i++) k.w[i] = k.w[i]! / s;
}

const TRIVIAL = 1e-5;
/** |ln Σ W| and Σ (Δ ln w)² at convergence: dew temperatures to about 1e-7 K, pressures to 1e-9 relative. */
const F_TOLERANCE = 1e-9;
const W_TOLERANCE = 1e-14;
const MAX_ITER = 300;

/**
 * Dew pressure of feed z (a vapour) at T: Newton on ln p for ln Σ W = 0 with the exact slope
 * Σ w_i (∂ln φ_i^V/∂ln p - ∂ln φ_i^L/∂ln p) from partial molar volumes, while the incipient liquid composition w
 * follows by successive substitution; started from p0 and w0 (Wilson's dew point, or a stability test's trial).
 * A positive slope marks the ordinary (lower) dew point, a negative one the retrograde (upper) dew point.
 */
export function dewPressure(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  T: number,
  p0: number,
  w0: ArrayLike<number>,
): SaturationPoint {
  const k = work(sys, z, w0);
  const change = { step: 0, trivial: 0, slope: 0 };
  let lnp = Math.log(p0);
  for (let iter = 1; iter <= MAX_ITER; iter++) {
    const p = Math.exp(lnp);
    const f = substitute(sys, z, T, p, k, 'pressure', change);
    if (change.trivial < TRIVIAL) return { ok: false, reason: 'trivial' };
    if (Math.abs(f) < F_TOLERANCE && change.step < W_TOLERANCE) return done(T, p, k, change.slope, iter);
    let step = change.slope !== 0 ? -f / change.slope : 0;
    if (!Number.isFinite(step)) return { ok: false, reason: 'no-convergence' };
    step = Math.max(-1, Math.min(1, step));
    lnp += step;
    if (iter % 5 === 0) extrapolate(k);
    if (lnp < Math.log(1) || lnp > Math.log(1e9)) return { ok: false, reason: 'out-of-range' };
  }
  return { ok: false, reason: 'no-convergence' };
}

/**
 * Dew temperature of feed z at p: as `dewPressure` but Newton on T, with the exact ∂ln Σ W/∂T at fixed compositions
 * (from ∂ln φ_i/∂T). A negative slope marks the ordinary dew point (heating evaporates the drop).
 */
export function dewTemperature(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
  p: number,
  T0: number,
  w0: ArrayLike<number>,
): SaturationPoint {
  const k = work(sys, z, w0);
  const change = { step: 0, trivial: 0, slope: 0 };
  let T = T0;
  for (let iter = 1; iter <= MAX_ITER; iter++) {
    const f = substitute(sys, z, T, p, k, 'temperature', change);
    if (change.trivial < TRIVIAL) return { ok: false, reason: 'trivial' };
    if (Math.abs(f) < F_TOLERANCE && change.step < W_TOLERANCE) return done(T, p, k, change.slope, iter);
    let step = change.slope !== 0 ? -f / change.slope : 0;
    if (!Number.isFinite(step)) return { ok: false, reason: 'no-convergence' };
    step = Math.max(-0.1 * T, Math.min(0.1 * T, step));
    T += step;
    if (iter % 5 === 0) extrapolate(k);
    if (T < 20 || T > 3000) return { ok: false, reason: 'out-of-range' };
  }
  return { ok: false, reason: 'no-convergence' };
}

function done(T: number, p: number, k: Work, slope: number, iterations: number): SaturationPoint {
  return {
    ok: true,
    temperatureK: T,
    pressurePa: p,
    incipient: Float64Array.from(k.w),
    slope,
    zFeed: k.stateZ.z,
    zIncipient: k.stateW.z,
    iterations,
  };
}

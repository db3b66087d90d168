import { DELTA_1 as D1, DELTA_2 as D2, SQRT2 as S2 } from './constants';

// Module-local copies (imported bindings are getters under tsx's CommonJS output).
const DELTA_1 = D1;
const DELTA_2 = D2;
const SQRT2 = S2;

/** Real roots Z > B of the Peng-Robinson cubic, filled in place. */
export type CubicRoots = {
  /** 1 or 3 (a double root counts as distinct roots that coincide). */
  count: number;
  /** Smallest root: the liquid (or the only) root. */
  zLiquid: number;
  /** Largest root: the vapour (or the only) root. */
  zVapour: number;
  /** The middle, mechanically unstable root when count is 3; NaN otherwise. */
  zMiddle: number;
};

export function newCubicRoots(): CubicRoots {
  return { count: 0, zLiquid: NaN, zVapour: NaN, zMiddle: NaN };
}

const TWO_PI_THIRD = (2 * Math.PI) / 3;

function polish(z: number, c2: number, c1: number, c0: number): number {
  for (let k = 0; k < 3; k++) {
    const f = ((z + c2) * z + c1) * z + c0;
    const df = (3 * z + 2 * c2) * z + c1;
    if (df === 0) break;
    const step = f / df;
    z -= step;
    if (Math.abs(step) <= 1e-15 * Math.abs(z)) break;
  }
  return z;
}

/**
 * Solves Z³ - (1 - B) Z² + (A - 3B² - 2B) Z - (A B - B² - B³) = 0 [pub: Peng & Robinson 1976, eq. 5] with
 * A = a p / (R T)², B = b p / (R T): Cardano's formula for one real root, the trigonometric form for three,
 * each polished by Newton steps. Roots at or below B (v <= b) are not physical and are dropped.
 */
export function solveCubic(A: number, B: number, out: CubicRoots): CubicRoots {
  const c2 = B - 1;
  const c1 = A - B * (3 * B + 2);
  const c0 = -B * (A - B - B * B);
  const shift = -c2 / 3;
  const p = c1 - (c2 * c2) / 3;
  const q = (2 * c2 * c2 * c2) / 27 - (c2 * c1) / 3 + c0;
  const disc = (q * q) / 4 + (p * p * p) / 27;
  let r0: number;
  let r1 = NaN;
  let r2 = NaN;
  if (disc > 0) {
    const s = Math.sqrt(disc);
    r0 = polish(Math.cbrt(-q / 2 + s) + Math.cbrt(-q / 2 - s) + shift, c2, c1, c0);
  } else {
    const m = Math.sqrt(-p / 3);
    const arg = m === 0 ? 0 : Math.max(-1, Math.min(1, -q / (2 * m * m * m)));
    const phi = Math.acos(arg) / 3;
    r0 = polish(2 * m * Math.cos(phi) + shift, c2, c1, c0);
    r1 = polish(2 * m * Math.cos(phi - TWO_PI_THIRD) + shift, c2, c1, c0);
    r2 = polish(2 * m * Math.cos(phi + TWO_PI_THIRD) + shift, c2, c1, c0);
  }
  // r0 is the largest root in both branches (cos(phi) >= cos(phi ± 2π/3) for phi in [0, π/3]).
  let count = 0;
  let lo = NaN;
  let mid = NaN;
  const hi = r0 > B ? r0 : NaN;
  if (hi === hi) count = 1;
  if (r1 === r1 && r2 === r2) {
    const a = Math.max(r1, r2);
    const b = Math.min(r1, r2);
    if (b > B) {
      lo = b;
      mid = a;
      count = 3;
    } else if (a > B) {
      lo = a;
      count = 2;
    }
  }
  if (count === 0) {
    // Only possible for inputs far outside any physical state; report the largest root regardless.
    out.count = 1;
    out.zLiquid = out.zVapour = Math.max(r0, B * (1 + 1e-12));
    out.zMiddle = NaN;
    return out;
  }
  // For p > 0, p(v) falls from +∞ at v = b to 0 at v = ∞, so it has 1 or 3 roots above b; a count of 2 is a
  // rounding artefact of a double root, reported as the single larger root.
  out.count = count === 3 ? 3 : 1;
  out.zVapour = hi === hi ? hi : lo;
  out.zLiquid = count === 3 ? lo : out.zVapour;
  out.zMiddle = count === 3 ? mid : NaN;
  return out;
}

/**
 * ln φ of the whole phase (Σ x_i ln φ_i) at root Z, i.e. the residual Gibbs energy g_r / (R T); of two roots the
 * one with the lower value is the stable phase.
 */
export function lnPhiOfRoot(z: number, A: number, B: number): number {
  return z - 1 - Math.log(z - B) - (A / (2 * SQRT2 * B)) * Math.log((z + DELTA_1 * B) / (z + DELTA_2 * B));
}

/** The root of the requested phase; 'stable' picks, of liquid and vapour roots, the one of lower Gibbs energy. */
export function pickRoot(roots: CubicRoots, A: number, B: number, phase: 'vapour' | 'liquid' | 'stable'): number {
  if (phase === 'vapour' || roots.count === 1) return phase === 'liquid' ? roots.zLiquid : roots.zVapour;
  if (phase === 'liquid') return roots.zLiquid;
  return lnPhiOfRoot(roots.zLiquid, A, B) < lnPhiOfRoot(roots.zVapour, A, B) ? roots.zLiquid : roots.zVapour;
}

/**
 * Vapour fraction β from the Rachford-Rice equation f(β) = Σ z_i (K_i - 1) / (1 + β (K_i - 1)) = 0
 * [pub: H. H. Rachford, J. D. Rice, J. Petrol. Technol. 4 (1952), sec. 1, p. 19]. f falls monotonically between
 * its poles 1/(1 - K_max) < β < 1/(1 - K_min); the root is found by Newton's method kept inside a shrinking
 * bracket, so it may lie outside [0, 1] (a "negative flash"), which tells the caller the feed is one phase.
 * Returns NaN when every K is on one side of 1 (no root: the feed is all vapour or all liquid).
 */
export function rachfordRice(z: ArrayLike<number>, K: ArrayLike<number>, n: number, start = 0.5): number {
  let kMax = -Infinity;
  let kMin = Infinity;
  for (let i = 0; i < n; i++) {
    if (z[i]! <= 0) continue;
    if (K[i]! > kMax) kMax = K[i]!;
    if (K[i]! < kMin) kMin = K[i]!;
  }
  if (!(kMax > 1 && kMin < 1)) return NaN;
  let lo = 1 / (1 - kMax);
  let hi = 1 / (1 - kMin);
  let beta = start > lo && start < hi ? start : 0.5 * (lo + hi);
  for (let iter = 0; iter < 200; iter++) {
    let f = 0;
    let df = 0;
    for (let i = 0; i < n; i++) {
      const c = K[i]! - 1;
      const d = 1 + beta * c;
      const t = (z[i]! * c) / d;
      f += t;
      df -= (t * c) / d;
    }
    if (f === 0) return beta;
    if (f > 0) lo = beta;
    else hi = beta;
    let next = beta - f / df;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - beta) <= 1e-15 * Math.max(1, Math.abs(beta))) return next;
    beta = next;
  }
  return beta;
}

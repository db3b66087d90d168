import type { PengRobinsonComponents } from './components';

/** Mixture attraction parameter and its temperature derivatives at one temperature. */
export type Attraction = { a: number; dadT: number; d2adT2: number };

/**
 * a(T) = Σ_i Σ_j x_i x_j sqrt(a_i a_j)(1 - k_ij) and its first two temperature derivatives, term by term
 * from |m_i(T)| (see PengRobinsonComponents). The general path, valid at every temperature; O(n²).
 */
export function mixtureAttraction(sys: PengRobinsonComponents, x: ArrayLike<number>, T: number, out: Attraction): void {
  sys.setTemperature(T);
  const n = sys.n;
  let a = 0;
  let da = 0;
  let d2a = 0;
  for (let i = 0; i < n; i++) {
    const ci = x[i]! * sys.sqrtAc[i]!;
    const ui = ci * sys.m[i]!;
    const dui = ci * sys.dm[i]!;
    const d2ui = ci * sys.d2m[i]!;
    for (let j = 0; j < n; j++) {
      const cj = x[j]! * sys.sqrtAc[j]!;
      const k = sys.oneMinusK[i * n + j]!;
      const uj = cj * sys.m[j]!;
      const duj = cj * sys.dm[j]!;
      a += k * ui * uj;
      da += 2 * k * ui * duj;
      d2a += 2 * k * (dui * duj + d2ui * uj);
    }
  }
  out.a = a;
  out.dadT = da;
  out.d2adT2 = d2a;
}

/**
 * Below the temperature where any 1 + κ_i(1 - sqrt(T/Tc_i)) reaches zero, each sqrt(α_i) is linear in
 * s = sqrt(T): sqrt(a_i) = c_i - d_i s. Then a(T) = A0 - 2 A1 s + A2 s² exactly, so a fixed composition needs
 * three numbers, not an n² sum, per temperature. Returns [A0, A1, A2, T_limit].
 */
export function attractionQuadratic(
  sys: PengRobinsonComponents,
  x: ArrayLike<number>,
): [number, number, number, number] {
  const n = sys.n;
  let a0 = 0;
  let a1 = 0;
  let a2 = 0;
  let limit = Infinity;
  for (let i = 0; i < n; i++) {
    const k = sys.kappa[i]!;
    const ci = x[i]! * sys.sqrtAc[i]! * (1 + k);
    const di = (x[i]! * sys.sqrtAc[i]! * k) / Math.sqrt(sys.tcK[i]!);
    if (k > 0 && x[i]! > 0) limit = Math.min(limit, sys.tcK[i]! * ((1 + k) / k) ** 2);
    for (let j = 0; j < n; j++) {
      const kj = sys.kappa[j]!;
      const cj = x[j]! * sys.sqrtAc[j]! * (1 + kj);
      const dj = (x[j]! * sys.sqrtAc[j]! * kj) / Math.sqrt(sys.tcK[j]!);
      const q = sys.oneMinusK[i * n + j]!;
      a0 += q * ci * cj;
      a1 += q * ci * dj;
      a2 += q * di * dj;
    }
  }
  return [a0, a1, a2, limit];
}

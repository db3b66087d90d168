import type { GergComponentId } from './components';
import { DEPARTURE_BINARIES } from './data/departure-functions';
import { PURE_FLUID_EQUATIONS } from './data/pure-fluid-coefficients';

/*
 * Collects the residual Helmholtz energy of one mixture into flat term lists. For a fixed composition,
 *   alpha^r = sum_i x_i alpha^r_oi + sum_{i<j} x_i x_j F_ij alpha^r_ij
 * is a plain sum of terms whose coefficients absorb x_i (pure fluids) or x_i x_j F_ij (departure functions).
 * Terms with the same exponents are merged (the 14 components of the 12-term short form share all their
 * exponents, and the generalized departure function is shared by up to 8 binaries), so a natural gas costs
 * little more than its largest pure-fluid equation.
 */

/** n delta^d tau^t */
export type PolynomialTerm = { n: number; d: number; t: number };
/** n delta^d tau^t exp(-delta^c), c >= 1 */
export type PowerExponentialTerm = { n: number; d: number; t: number; c: number };
/** n delta^d tau^t exp(-eta (delta - eps)^2 - beta (delta - gamma)) */
export type GaussianTerm = { n: number; d: number; t: number; eta: number; eps: number; beta: number; gamma: number };

export type MixtureTerms = {
  polynomial: PolynomialTerm[];
  powerExponential: PowerExponentialTerm[];
  gaussian: GaussianTerm[];
};

/** The merged terms of the mixture of `ids` at mole fractions `x` (both in the same order, all x > 0). */
export function collectTerms(ids: readonly GergComponentId[], x: readonly number[]): MixtureTerms {
  const polynomial = new Map<string, PolynomialTerm>();
  const powerExponential = new Map<string, PowerExponentialTerm>();
  const gaussian = new Map<string, GaussianTerm>();
  const add = <T extends { n: number }>(map: Map<string, T>, key: string, term: T) => {
    const existing = map.get(key);
    if (existing) existing.n += term.n;
    else map.set(key, term);
  };

  ids.forEach((id, i) => {
    const { exponents, n } = PURE_FLUID_EQUATIONS[id];
    exponents.forEach(([d, t, c], k) => {
      const coefficient = x[i]! * n[k]!;
      if (c === 0) add(polynomial, `${d}|${t}`, { n: coefficient, d, t });
      else add(powerExponential, `${d}|${t}|${c}`, { n: coefficient, d, t, c });
    });
  });

  const position = new Map(ids.map((id, i) => [id, i]));
  for (const [a, b, f, fn] of DEPARTURE_BINARIES) {
    const ia = position.get(a);
    const ib = position.get(b);
    if (ia === undefined || ib === undefined) continue;
    const weight = x[ia]! * x[ib]! * f;
    fn.terms.forEach(([n, d, t, eta = 0, eps = 0, beta = 0, gamma = 0], k) => {
      if (k < fn.polynomialTerms) add(polynomial, `${d}|${t}`, { n: weight * n, d, t });
      else add(gaussian, `${d}|${t}|${eta}|${eps}|${beta}|${gamma}`, { n: weight * n, d, t, eta, eps, beta, gamma });
    });
  }

  const nonZero = <T extends { n: number }>(map: Map<string, T>) => [...map.values()].filter((term) => term.n !== 0);
  return { polynomial: nonZero(polynomial), powerExponential: nonZero(powerExponential), gaussian: nonZero(gaussian) };
}

/*
 * Exponents of the pure-fluid residual equations of GERG-2008:
 *   alpha^r_oi(delta, tau) = sum_{k=1..Kpol} n_k delta^d_k tau^t_k
 *                          + sum_{k=Kpol+1..Kpol+Kexp} n_k delta^d_k tau^t_k exp(-delta^c_k)
 * [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032-3091, Eq. (7.5) and Tables A2-A4], transcribed
 * from NIST's public-domain AGA8 reference implementation (usnistgov/AGA8, AGA8CODE/C/GERG2008.cpp).
 *
 * Each row is [d, t, c]; c = 0 marks a polynomial term (no exponential factor).
 */

export type TermExponents = readonly [d: number, t: number, c: number];

/** Methane, nitrogen and ethane: 6 polynomial + 18 exponential terms. */
export const LONG_FORM_EXPONENTS: readonly TermExponents[] = [
  [1, 0.125, 0],
  [1, 1.125, 0],
  [2, 0.375, 0],
  [2, 1.125, 0],
  [4, 0.625, 0],
  [4, 1.5, 0],
  [1, 0.625, 1],
  [1, 2.625, 1],
  [1, 2.75, 1],
  [2, 2.125, 1],
  [3, 2, 1],
  [6, 1.75, 1],
  [2, 4.5, 2],
  [3, 4.75, 2],
  [3, 5, 2],
  [4, 4, 2],
  [4, 4.5, 2],
  [2, 7.5, 3],
  [3, 14, 3],
  [4, 11.5, 3],
  [5, 26, 6],
  [6, 28, 6],
  [6, 30, 6],
  [7, 16, 6],
];

/**
 * The 12-term "short" form shared by propane, the butanes, pentanes, n-hexane to n-decane, oxygen, carbon
 * monoxide, hydrogen sulfide and argon: 6 polynomial + 6 exponential terms.
 */
export const SHORT_FORM_EXPONENTS: readonly TermExponents[] = [
  [1, 0.25, 0],
  [1, 1.125, 0],
  [1, 1.5, 0],
  [2, 1.375, 0],
  [3, 0.25, 0],
  [7, 0.875, 0],
  [2, 0.625, 1],
  [5, 1.75, 1],
  [1, 3.625, 2],
  [4, 3.625, 2],
  [3, 14.5, 3],
  [4, 12, 3],
];

/** Carbon dioxide: 4 polynomial + 18 exponential terms. */
export const CO2_EXPONENTS: readonly TermExponents[] = [
  [1, 0, 0],
  [1, 1.25, 0],
  [2, 1.625, 0],
  [3, 0.375, 0],
  [3, 0.375, 1],
  [3, 1.375, 1],
  [4, 1.125, 1],
  [5, 1.375, 1],
  [6, 0.125, 1],
  [6, 1.625, 1],
  [1, 3.75, 2],
  [4, 3.5, 2],
  [1, 7.5, 3],
  [1, 8, 3],
  [3, 6, 3],
  [3, 16, 3],
  [4, 11, 3],
  [5, 24, 5],
  [5, 26, 5],
  [5, 28, 5],
  [5, 24, 6],
  [5, 26, 6],
];

/** Hydrogen: 5 polynomial + 9 exponential terms. */
export const H2_EXPONENTS: readonly TermExponents[] = [
  [1, 0.5, 0],
  [1, 0.625, 0],
  [2, 0.375, 0],
  [2, 0.625, 0],
  [4, 1.125, 0],
  [1, 2.625, 1],
  [5, 0, 1],
  [5, 0.25, 1],
  [5, 1.375, 1],
  [1, 4, 2],
  [1, 4.25, 2],
  [2, 5, 3],
  [5, 8, 3],
  [1, 8, 5],
];

/** Water: 7 polynomial + 9 exponential terms. */
export const H2O_EXPONENTS: readonly TermExponents[] = [
  [1, 0.5, 0],
  [1, 1.25, 0],
  [1, 1.875, 0],
  [2, 0.125, 0],
  [2, 1.5, 0],
  [3, 1, 0],
  [4, 0.75, 0],
  [1, 1.5, 1],
  [5, 0.625, 1],
  [5, 2.625, 1],
  [1, 5, 2],
  [2, 4, 2],
  [4, 4.5, 2],
  [4, 3, 3],
  [1, 4, 5],
  [1, 6, 5],
];

/** Helium: 4 polynomial + 8 exponential terms. */
export const HE_EXPONENTS: readonly TermExponents[] = [
  [1, 0, 0],
  [1, 0.125, 0],
  [1, 0.75, 0],
  [4, 1, 0],
  [1, 0.75, 1],
  [3, 2.625, 1],
  [5, 0.125, 1],
  [5, 1.25, 1],
  [5, 2, 1],
  [2, 1, 2],
  [1, 4.5, 3],
  [2, 5, 3],
];

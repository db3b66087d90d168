import { GAS_CONSTANT_J_PER_MOL_K } from '../../constants';

/*
 * Constants of the Peng-Robinson equation [pub: D.-Y. Peng, D. B. Robinson, Ind. Eng. Chem. Fundam. 15 (1976)
 * 59-64, eqs. 9-13]:
 *   p = R T / (v - b) - a(T) / (v² + 2 b v - b²)
 *   a_i = Ωa R² Tc² / pc · α(T),  b_i = Ωb R Tc / pc,  α = [1 + κ (1 - sqrt(T / Tc))]²
 * The paper prints Ωa = 0.45724 and Ωb = 0.07780, the rounded values of the exact ones that make the critical
 * isotherm have a triple root in Z at (Tc, pc). The exact values are used so that the equation reproduces Tc and
 * pc to machine precision: with Zc = (1 - Ωb) / 3 and Ωa = 3 Zc² + 3 Ωb² + 2 Ωb, Ωb is the real root of
 * Zc³ = Ωa Ωb - Ωb² - Ωb³ (the cubic's constant term), solved once by bisection to the digits below.
 */
export const OMEGA_B = 0.07779607390388846;
export const CRITICAL_Z = (1 - OMEGA_B) / 3;
export const OMEGA_A = 3 * CRITICAL_Z * CRITICAL_Z + 3 * OMEGA_B * OMEGA_B + 2 * OMEGA_B;

/** b rho at the critical density: a phase denser than this is called liquid-like. */
export const CRITICAL_REDUCED_DENSITY = OMEGA_B / CRITICAL_Z;

/** Molar gas constant, J/(mol K) [pub: CODATA 2018]. */
export const R = GAS_CONSTANT_J_PER_MOL_K;

export const SQRT2 = Math.SQRT2;
/** The roots 1 ± sqrt(2) of the attractive term's denominator v² + 2 b v - b² = (v + δ1 b)(v + δ2 b). */
export const DELTA_1 = 1 + SQRT2;
export const DELTA_2 = 1 - SQRT2;

/** Above this acentric factor the 1978 κ correlation is used. */
export const HEAVY_OMEGA = 0.49;

/**
 * κ(ω). Up to ω = 0.49: κ = 0.37464 + 1.54226 ω - 0.26992 ω² [pub: Peng & Robinson 1976, eq. 18].
 * Above: κ = 0.379642 + 1.48503 ω - 0.164423 ω² + 0.016666 ω³ [pub: D. B. Robinson, D.-Y. Peng, "The
 * characterization of the heptanes and heavier fractions for the GPA Peng-Robinson programs", GPA Research
 * Report RR-28 (1978)], which the authors fitted to heavier hydrocarbons because the 1976 quadratic
 * overestimates κ there. At ω = 0.49 the two differ by 0.4 %, so the switch leaves no visible step; among
 * the species here it matters only for n-decane and heavier.
 */
export function kappaOf(omega: number): number {
  if (omega > HEAVY_OMEGA) return 0.379642 + omega * (1.48503 + omega * (-0.164423 + omega * 0.016666));
  return 0.37464 + omega * (1.54226 - 0.26992 * omega);
}

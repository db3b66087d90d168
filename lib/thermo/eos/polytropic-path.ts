import { densityAt, stateAtDensity, newFluidState, type FluidState } from './state';
import type { EquationOfState } from './types';

/*
 * A polytropic compression on real-gas properties: every infinitesimal step has the same efficiency,
 * dh = v dp / eta_p, so the polytropic head is the integral of v dp = eta_p (h2 - h1)
 * [pub: ASME PTC 10-1997, section 5 and Appendix C, sets out polytropic work and the Schultz correction;
 * the step integration is the rigorous form of the same definition].
 *
 * The path is integrated in (T, rho) with ln p as the independent variable, so no density solve is needed
 * inside a step: along the path
 *   (dh/dT)_rho T' + (dh/drho)_T rho' = v / eta_p,      (dp/dT)_rho T' + (dp/drho)_T rho' = 1,
 * with (dh/dT)_rho = cv + (dp/dT)/rho and (dh/drho)_T = ((dp/drho)_T - T (dp/dT)_rho / rho) / rho.
 * Classical fourth-order Runge-Kutta; the end state is put back on p2 by one density solve at the final T.
 */

/** Steps per stage: the discharge temperature changes by less than 1 mK when doubled (tests check it). */
export const DEFAULT_POLYTROPIC_STEPS = 12;

export type PolytropicEnd = {
  /** The discharge state at p2. */
  end: FluidState;
  /** Integral of v dp along the path, J/mol. */
  polytropicHeadJPerMol: number;
  /** n in p v^n = const between the end states: ln(p2/p1) / ln(rho2/rho1). */
  polytropicExponent: number;
  steps: number;
};

const s = newFluidState();

// Derivatives of T and rho with respect to ln p along the path, at (t, rho).
function slopes(eos: EquationOfState, t: number, rho: number, eta: number, out: [number, number]): void {
  stateAtDensity(eos, t, rho, s);
  const pT = s.dpdT;
  const pR = s.dpdRho;
  const hT = s.cvJPerMolK + pT / rho;
  const hR = (pR - (t * pT) / rho) / rho;
  const v = 1 / rho;
  const det = hT * pR - hR * pT;
  const p = s.pressurePa;
  out[0] = (p * ((v / eta) * pR - hR)) / det;
  out[1] = (p * (hT - (pT * v) / eta)) / det;
}

const k1: [number, number] = [0, 0];
const k2: [number, number] = [0, 0];
const k3: [number, number] = [0, 0];
const k4: [number, number] = [0, 0];

/** Compresses from `start` to p2 along a path of constant polytropic efficiency. */
export function compressPolytropic(
  eos: EquationOfState,
  start: FluidState,
  dischargePressurePa: number,
  polytropicEfficiency: number,
  steps = DEFAULT_POLYTROPIC_STEPS,
): PolytropicEnd {
  const eta = polytropicEfficiency;
  const dx = Math.log(dischargePressurePa / start.pressurePa) / steps;
  let t = start.temperatureK;
  let rho = start.densityMolPerM3;
  for (let i = 0; i < steps; i++) {
    slopes(eos, t, rho, eta, k1);
    slopes(eos, t + 0.5 * dx * k1[0], rho + 0.5 * dx * k1[1], eta, k2);
    slopes(eos, t + 0.5 * dx * k2[0], rho + 0.5 * dx * k2[1], eta, k3);
    slopes(eos, t + dx * k3[0], rho + dx * k3[1], eta, k4);
    t += (dx / 6) * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
    rho += (dx / 6) * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
  }
  const end = newFluidState();
  stateAtDensity(eos, t, densityAt(eos, t, dischargePressurePa, 'vapour', rho), end);
  end.pressurePa = dischargePressurePa;
  const head = eta * (end.enthalpyJPerMol - start.enthalpyJPerMol);
  const exponent =
    Math.log(dischargePressurePa / start.pressurePa) / Math.log(end.densityMolPerM3 / start.densityMolPerM3);
  return { end, polytropicHeadJPerMol: head, polytropicExponent: exponent, steps };
}

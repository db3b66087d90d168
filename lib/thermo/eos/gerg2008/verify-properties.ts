import { newResidualDerivatives, type EquationOfState } from '../types';

/*
 * A minimal property calculator on the EquationOfState contract, used to verify GERG-2008 against
 * published values; the general property layer supersedes it. Formulas from the reduced Helmholtz energy
 * a/(RT) = a0 + A(T, rho) [pub: Span, Multiparameter Equations of State, Springer (2000), Table 3.3;
 * Kunz & Wagner, J. Chem. Eng. Data 57 (2012), Table B1]:
 *   p = rho R T (1 + aD)            dp/drho = R T (1 + 2 aD + aDD)      dp/dT = rho R (1 + aD + aDT)
 *   h = h0 + R T (aD - aT)          s = s0 - R ln(rho R T / p0) - R (a + aT)
 *   cv = cp0 - R - R (aTT + 2 aT)   cp = cv + T (dp/dT)^2 / (rho^2 dp/drho)
 *   w^2 = (cp/cv) (dp/drho) / M     mu_JT = (T (dp/dT) / (rho dp/drho) - 1) / (rho cp)
 *   kappa = (cp/cv) (rho/p) dp/drho (isentropic exponent)
 * Units: SI, molar; s0 at p0 = 100 kPa and without the entropy of mixing.
 */

const P0 = 100_000;

export type VerifiedState = {
  temperatureK: number;
  densityMolPerM3: number;
  pressurePa: number;
  z: number;
  dpdrho: number;
  dpdT: number;
  enthalpyJPerMol: number;
  entropyJPerMolK: number;
  cvJPerMolK: number;
  cpJPerMolK: number;
  speedOfSoundMPerS: number;
  jouleThomsonKPerPa: number;
  isentropicExponent: number;
  /** h - h0 at the same T, J/mol */
  residualEnthalpyJPerMol: number;
};

export function stateAt(eos: EquationOfState, temperatureK: number, densityMolPerM3: number): VerifiedState {
  const r = newResidualDerivatives();
  eos.residual.evaluate(temperatureK, densityMolPerM3, r);
  const R = eos.gasConstantJPerMolK;
  const T = temperatureK;
  const rho = densityMolPerM3;
  const pressurePa = rho * R * T * (1 + r.aD);
  const dpdrho = R * T * (1 + 2 * r.aD + r.aDD);
  const dpdT = rho * R * (1 + r.aD + r.aDT);
  const residualEnthalpyJPerMol = R * T * (r.aD - r.aT);
  const cvJPerMolK = eos.ideal.cp0(T) - R - R * (r.aTT + 2 * r.aT);
  const cpJPerMolK = cvJPerMolK + (T * dpdT * dpdT) / (rho * rho * dpdrho);
  const gamma = cpJPerMolK / cvJPerMolK;
  return {
    temperatureK: T,
    densityMolPerM3: rho,
    pressurePa,
    z: 1 + r.aD,
    dpdrho,
    dpdT,
    enthalpyJPerMol: eos.ideal.h0(T) + residualEnthalpyJPerMol,
    entropyJPerMolK: eos.ideal.s0(T) - R * Math.log((rho * R * T) / P0) - R * (r.a + r.aT),
    cvJPerMolK,
    cpJPerMolK,
    speedOfSoundMPerS: Math.sqrt((gamma * dpdrho) / (eos.molarMassKgPerKmol / 1000)),
    jouleThomsonKPerPa: ((T * dpdT) / (rho * dpdrho) - 1) / (rho * cpJPerMolK),
    isentropicExponent: (gamma * rho * dpdrho) / pressurePa,
    residualEnthalpyJPerMol,
  };
}

/**
 * The density at (T, p): Newton's method on p(T, rho) - p in ln(rho) from the equation's own starting
 * guess for the phase, kept inside a bracket that every iterate narrows (bisection when a step would
 * leave it). A point where dp/drho <= 0 lies inside the spinodal: the vapour root is below it, the liquid
 * root above. Throws if no root is found (e.g. a vapour asked for at a compressed-liquid state). It
 * does not judge phase stability: inside the two-phase region a multiparameter equation can have further
 * roots with dp/drho > 0, and one of those may be returned; that is the property layer's job.
 */
export function densityAt(
  eos: EquationOfState,
  temperatureK: number,
  pressurePa: number,
  phase: 'vapour' | 'liquid' = 'vapour',
): number {
  const r = newResidualDerivatives();
  const RT = eos.gasConstantJPerMolK * temperatureK;
  let lo = Math.log(1e-12);
  let hi = Math.log(eos.residual.maxDensityMolPerM3);
  let lnRho = Math.log(eos.residual.densityGuess(temperatureK, pressurePa, phase));
  for (let iteration = 0; iteration < 200; iteration++) {
    const rho = Math.exp(lnRho);
    eos.residual.evaluate(temperatureK, rho, r);
    const slope = rho * RT * (1 + 2 * r.aD + r.aDD); // dp/d(ln rho)
    let next: number;
    if (!(slope > 0)) {
      if (phase === 'vapour') hi = lnRho;
      else lo = lnRho;
      next = phase === 'vapour' ? lnRho - 0.1 : lnRho + 0.1;
    } else {
      const f = rho * RT * (1 + r.aD) - pressurePa;
      if (f < 0) lo = lnRho;
      else hi = lnRho;
      const step = -f / slope;
      if (Math.abs(step) < 1e-12) return Math.exp(lnRho + step);
      next = lnRho + Math.max(-1, Math.min(1, step));
    }
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    if (hi - lo < 1e-15) break;
    lnRho = next;
  }
  throw new Error(`no ${phase} density found at ${temperatureK} K and ${pressurePa} Pa`);
}

export function stateAtPressure(
  eos: EquationOfState,
  temperatureK: number,
  pressurePa: number,
  phase: 'vapour' | 'liquid' = 'vapour',
): VerifiedState {
  return stateAt(eos, temperatureK, densityAt(eos, temperatureK, pressurePa, phase));
}

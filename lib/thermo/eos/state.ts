import { EosError } from './eos-error';
import { newResidualDerivatives, type EquationOfState, type ResidualDerivatives } from './types';

/*
 * Properties of a fluid state from an equation of state written as a Helmholtz energy, in temperature and
 * molar density. With A = a_r/(RT) and the scaled derivatives of types.ts
 * [pub: Span, Multiparameter Equations of State (2000), Table 3.3, rewritten in T and rho]:
 *   p = rho R T (1 + aD)
 *   (dp/drho)_T = R T (1 + 2 aD + aDD)          (dp/dT)_rho = rho R (1 + aD + aDT)
 *   h = h0(T) + R T (aD - aT)                    s = s0(T) - R ln(rho R T / p0) - R (a + aT)
 *   cv = cp0(T) - R - R (2 aT + aTT)             cp = cv + T (dp/dT)^2 / (rho^2 (dp/drho)_T)
 *   w^2 = (cp/cv) (dp/drho)_T / M                kappa_s = (rho/p) (cp/cv) (dp/drho)_T
 */

/** Standard pressure of the ideal-gas entropy s0(T), Pa. */
const P0_PA = 100_000;

/** A fluid state; molar, SI. Filled in place by the functions below. */
export type FluidState = {
  temperatureK: number;
  pressurePa: number;
  densityMolPerM3: number;
  z: number;
  /** J/mol, on the equation's ideal-gas reference. */
  enthalpyJPerMol: number;
  /** J/(mol K), on the equation's ideal-gas reference. */
  entropyJPerMolK: number;
  /** h - h_ideal(T), J/mol. */
  enthalpyDepartureJPerMol: number;
  /** s - s_ideal(T, p), J/(mol K). */
  entropyDepartureJPerMolK: number;
  cpJPerMolK: number;
  cvJPerMolK: number;
  /** (dp/drho)_T, Pa m3/mol. */
  dpdRho: number;
  /** (dp/dT)_rho, Pa/K. */
  dpdT: number;
  speedOfSoundMPerS: number;
  /** Isentropic exponent kappa = -(v/p)(dp/dv)_s; equals cp/cv only for an ideal gas. */
  isentropicExponent: number;
  /** (dT/dp)_h, K/Pa. */
  jouleThomsonKPerPa: number;
};

/** A zeroed state to fill in place. */
export function newFluidState(): FluidState {
  return {
    temperatureK: 0,
    pressurePa: 0,
    densityMolPerM3: 0,
    z: 0,
    enthalpyJPerMol: 0,
    entropyJPerMolK: 0,
    enthalpyDepartureJPerMol: 0,
    entropyDepartureJPerMolK: 0,
    cpJPerMolK: 0,
    cvJPerMolK: 0,
    dpdRho: 0,
    dpdT: 0,
    speedOfSoundMPerS: 0,
    isentropicExponent: 0,
    jouleThomsonKPerPa: 0,
  };
}

const d: ResidualDerivatives = newResidualDerivatives();

/** Fills `out` with every property at (T, rho). */
export function stateAtDensity(
  eos: EquationOfState,
  temperatureK: number,
  densityMolPerM3: number,
  out: FluidState,
): FluidState {
  const r = eos.gasConstantJPerMolK;
  const t = temperatureK;
  const rho = densityMolPerM3;
  eos.residual.evaluate(t, rho, d);
  const rt = r * t;
  const p = rho * rt * (1 + d.aD);
  const dpdRho = rt * (1 + 2 * d.aD + d.aDD);
  const dpdT = rho * r * (1 + d.aD + d.aDT);
  const cp0 = eos.ideal.cp0(t);
  const cv = cp0 - r - r * (2 * d.aT + d.aTT);
  const cp = cv + (t * dpdT * dpdT) / (rho * rho * dpdRho);
  const z = 1 + d.aD;
  const hDeparture = rt * (d.aD - d.aT);
  // s - s_ideal(T, p): the residual entropy at (T, rho) plus R ln Z, because the ideal gas at the same p
  // has density rho Z.
  const sDeparture = -r * (d.a + d.aT) + r * Math.log(z);
  const m = eos.molarMassKgPerKmol / 1000;
  out.temperatureK = t;
  out.pressurePa = p;
  out.densityMolPerM3 = rho;
  out.z = z;
  out.enthalpyJPerMol = eos.ideal.h0(t) + hDeparture;
  out.entropyJPerMolK = eos.ideal.s0(t) - r * Math.log(p / P0_PA) + sDeparture;
  out.enthalpyDepartureJPerMol = hDeparture;
  out.entropyDepartureJPerMolK = sDeparture;
  out.cpJPerMolK = cp;
  out.cvJPerMolK = cv;
  out.dpdRho = dpdRho;
  out.dpdT = dpdT;
  out.speedOfSoundMPerS = Math.sqrt(((cp / cv) * dpdRho) / m);
  out.isentropicExponent = (rho / p) * (cp / cv) * dpdRho;
  out.jouleThomsonKPerPa = ((t * dpdT) / (rho * rho * dpdRho) - 1 / rho) / cp;
  return out;
}

const MAX_NEWTON = 60;
const RELATIVE_PRESSURE_TOLERANCE = 1e-11;

/** Pressure and its density derivative at (T, rho): [p, (dp/drho)_T]. Reuses the module scratch. */
function pressureAndSlope(eos: EquationOfState, t: number, rho: number, out: [number, number]): void {
  eos.residual.evaluate(t, rho, d);
  const rt = eos.gasConstantJPerMolK * t;
  out[0] = rho * rt * (1 + d.aD);
  out[1] = rt * (1 + 2 * d.aD + d.aDD);
}

const ps: [number, number] = [0, 0];

/**
 * Newton on ln(rho) from `start`; returns the root only if it converged on a mechanically stable branch
 * ((dp/drho)_T > 0), else NaN.
 */
function newtonDensity(eos: EquationOfState, t: number, p: number, start: number): number {
  let lnRho = Math.log(start);
  const lnMax = Math.log(eos.residual.maxDensityMolPerM3);
  for (let i = 0; i < MAX_NEWTON; i++) {
    const rho = Math.exp(lnRho);
    pressureAndSlope(eos, t, rho, ps);
    if (!(ps[1] > 0)) return NaN;
    const f = ps[0] - p;
    if (Math.abs(f) <= RELATIVE_PRESSURE_TOLERANCE * p) return rho;
    let step = -f / (rho * ps[1]);
    // Damp long jumps: a step of more than e^0.7 in density usually overshoots onto another branch.
    if (step > 0.7) step = 0.7;
    else if (step < -0.7) step = -0.7;
    lnRho += step;
    if (lnRho >= lnMax) lnRho = 0.5 * (Math.log(rho) + lnMax);
  }
  return NaN;
}

/**
 * The root of p(T, rho) = p on the branch asked for, by a scan in density when Newton from the guesses
 * fails: the vapour root is the lowest-density stable root, the liquid root the highest.
 */
function scanDensity(eos: EquationOfState, t: number, p: number, phase: 'vapour' | 'liquid'): number {
  const max = eos.residual.maxDensityMolPerM3;
  const ideal = p / (eos.gasConstantJPerMolK * t);
  const factor = 1.1;
  const steps = Math.ceil(Math.log(max / (1e-3 * ideal)) / Math.log(factor));
  let found = NaN;
  let prevRho = 1e-3 * ideal;
  pressureAndSlope(eos, t, prevRho, ps);
  let prevF = ps[0] - p;
  for (let i = 1; i <= steps; i++) {
    const rho = Math.min(1e-3 * ideal * Math.pow(factor, i), max * 0.999999);
    pressureAndSlope(eos, t, rho, ps);
    const f = ps[0] - p;
    if (prevF < 0 && f >= 0 && ps[1] > 0) {
      const root = newtonDensity(eos, t, p, rho) || bisectDensity(eos, t, p, prevRho, rho);
      if (phase === 'vapour') return root;
      found = root;
    }
    prevRho = rho;
    prevF = f;
  }
  return found;
}

function bisectDensity(eos: EquationOfState, t: number, p: number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    pressureAndSlope(eos, t, mid, ps);
    if (ps[0] < p) lo = mid;
    else hi = mid;
    if (hi - lo <= 1e-13 * hi) break;
  }
  return 0.5 * (lo + hi);
}

/**
 * Molar density (mol/m3) at (T, p) on the vapour (gas or supercritical) or liquid branch. Starts from
 * `guess` when given (e.g. the previous step's density), else from the equation's own estimate.
 * Throws EosError when no root exists on that branch.
 */
export function densityAt(
  eos: EquationOfState,
  temperatureK: number,
  pressurePa: number,
  phase: 'vapour' | 'liquid' = 'vapour',
  guess?: number,
): number {
  if (!(temperatureK > 0 && pressurePa > 0)) {
    throw new EosError(`no fluid state at T = ${temperatureK} K, p = ${pressurePa} Pa`);
  }
  let rho = guess !== undefined && guess > 0 ? newtonDensity(eos, temperatureK, pressurePa, guess) : NaN;
  if (Number.isNaN(rho)) {
    rho = newtonDensity(eos, temperatureK, pressurePa, eos.residual.densityGuess(temperatureK, pressurePa, phase));
  }
  if (Number.isNaN(rho)) rho = scanDensity(eos, temperatureK, pressurePa, phase);
  if (!(rho > 0)) {
    throw new EosError(
      `the ${eos.id} equation has no ${phase} root at ${temperatureK.toFixed(2)} K and ${(pressurePa / 1000).toFixed(1)} kPa`,
    );
  }
  return rho;
}

/** Fills `out` at (T, p) on the branch asked for. */
export function stateAt(
  eos: EquationOfState,
  temperatureK: number,
  pressurePa: number,
  out: FluidState,
  phase: 'vapour' | 'liquid' = 'vapour',
  guess?: number,
): FluidState {
  stateAtDensity(eos, temperatureK, densityAt(eos, temperatureK, pressurePa, phase, guess), out);
  // Report the pressure asked for, not the one the converged density reproduces to 1e-11.
  out.pressurePa = pressurePa;
  return out;
}

import { EosError } from './eos-error';
import { densityAt, stateAtDensity, type FluidState } from './state';
import type { EquationOfState } from './types';

/*
 * States at a given pressure from an entropy or an enthalpy: Newton on temperature with the density solved
 * at each step on the vapour branch (warm-started from the last one). At fixed p,
 * (ds/dT)_p = cp/T and (dh/dT)_p = cp, so Newton converges in a few steps from any nearby guess.
 */

const MAX_ITERATIONS = 50;
const TOLERANCE_K = 1e-9;
const MAX_STEP_FRACTION = 0.25;

type Target = 'entropy' | 'enthalpy';

function solve(
  eos: EquationOfState,
  pressurePa: number,
  target: number,
  kind: Target,
  guessK: number,
  out: FluidState,
  guessDensity?: number,
): FluidState {
  let t = guessK;
  let rho = guessDensity;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    rho = densityAt(eos, t, pressurePa, 'vapour', rho);
    stateAtDensity(eos, t, rho, out);
    const f = kind === 'entropy' ? out.entropyJPerMolK - target : out.enthalpyJPerMol - target;
    const slope = kind === 'entropy' ? out.cpJPerMolK / t : out.cpJPerMolK;
    let step = -f / slope;
    const limit = MAX_STEP_FRACTION * t;
    if (step > limit) step = limit;
    else if (step < -limit) step = -limit;
    // Keep the ideal-gas density scaling for the next guess: rho ~ p/T.
    rho = (rho * t) / (t + step);
    t += step;
    if (Math.abs(step) <= TOLERANCE_K * t) {
      stateAtDensity(eos, t, densityAt(eos, t, pressurePa, 'vapour', rho), out);
      out.pressurePa = pressurePa;
      return out;
    }
  }
  throw new EosError(`the ${eos.id} ${kind} solve at ${(pressurePa / 1000).toFixed(1)} kPa did not converge`);
}

/** The vapour-branch state at p with entropy s (J/(mol K)); `guessK` near the answer speeds it up. */
export function stateFromEntropy(
  eos: EquationOfState,
  pressurePa: number,
  entropyJPerMolK: number,
  guessK: number,
  out: FluidState,
  guessDensity?: number,
): FluidState {
  return solve(eos, pressurePa, entropyJPerMolK, 'entropy', guessK, out, guessDensity);
}

/** The vapour-branch state at p with enthalpy h (J/mol). */
export function stateFromEnthalpy(
  eos: EquationOfState,
  pressurePa: number,
  enthalpyJPerMol: number,
  guessK: number,
  out: FluidState,
  guessDensity?: number,
): FluidState {
  return solve(eos, pressurePa, enthalpyJPerMol, 'enthalpy', guessK, out, guessDensity);
}

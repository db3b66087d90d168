import { compileEquation } from '../../thermo/eos/compile';
import { stateFromEnthalpy, stateFromEntropy } from '../../thermo/eos/flash';
import { densityAt, newFluidState, stateAtDensity, type FluidState } from '../../thermo/eos/state';
import type { EquationOfState } from '../../thermo/eos/types';
import type { GasModel } from '../../thermo/gas-model';

export type RealEquationId = 'peng-robinson' | 'gerg-2008';

/**
 * A gas compiled for one real-gas equation, with Peng-Robinson beside it: its cubic root is where the
 * density solve of a multiparameter equation starts, which keeps it on the gas branch at high pressure.
 */
export type RealFluid = {
  readonly id: RealEquationId;
  readonly gas: GasModel;
  readonly eos: EquationOfState;
  readonly guide: EquationOfState;
  /** kg/mol, for converting the molar properties to the engine's mass basis. */
  readonly kgPerMol: number;
};

// Gases are compiled once and cached (lib/thermo/gas-cache.ts), so their equations can hang off them.
const cache = new WeakMap<GasModel, Partial<Record<RealEquationId, RealFluid>>>();

/** The gas compiled for `id`, built on first use. */
export function realFluid(gas: GasModel, id: RealEquationId): RealFluid {
  let entry = cache.get(gas);
  if (!entry) {
    entry = {};
    cache.set(gas, entry);
  }
  const hit = entry[id];
  if (hit) return hit;
  const eos = compileEquation(id, gas);
  const guide = id === 'peng-robinson' ? eos : realFluid(gas, 'peng-robinson').eos;
  const fluid: RealFluid = { id, gas, eos, guide, kgPerMol: eos.molarMassKgPerKmol / 1000 };
  entry[id] = fluid;
  return fluid;
}

/** Gas-branch density at (T, p), started from the guide equation's root when no better guess is known. */
export function gasDensity(fluid: RealFluid, temperatureK: number, pressurePa: number, guess?: number): number {
  const start = guess ?? fluid.guide.residual.densityGuess(temperatureK, pressurePa, 'vapour');
  return densityAt(fluid.eos, temperatureK, pressurePa, 'vapour', start);
}

/** Gas-branch state at (T, p), filled into `out` (a new state when omitted). */
export function gasState(
  fluid: RealFluid,
  temperatureK: number,
  pressurePa: number,
  out: FluidState = newFluidState(),
): FluidState {
  stateAtDensity(fluid.eos, temperatureK, gasDensity(fluid, temperatureK, pressurePa), out);
  out.pressurePa = pressurePa;
  return out;
}

/** State at p with the entropy of `from` (an isentrope), guessed from the ideal-gas exponent. */
export function isentropicState(fluid: RealFluid, from: FluidState, pressurePa: number, out: FluidState): FluidState {
  const k = from.cpJPerMolK / from.cvJPerMolK;
  const guess = from.temperatureK * Math.pow(pressurePa / from.pressurePa, (k - 1) / k);
  const rho = fluid.guide.residual.densityGuess(guess, pressurePa, 'vapour');
  return stateFromEntropy(fluid.eos, pressurePa, from.entropyJPerMolK, guess, out, rho);
}

/** State at p with enthalpy h (J/mol). */
export function stateAtEnthalpy(
  fluid: RealFluid,
  pressurePa: number,
  enthalpyJPerMol: number,
  guessK: number,
  out: FluidState,
): FluidState {
  const rho = fluid.guide.residual.densityGuess(guessK, pressurePa, 'vapour');
  return stateFromEnthalpy(fluid.eos, pressurePa, enthalpyJPerMol, guessK, out, rho);
}

/** Compressibility factor at (T, p) on the gas branch. */
export function compressibility(fluid: RealFluid, temperatureK: number, pressurePa: number): number {
  const rho = gasDensity(fluid, temperatureK, pressurePa);
  return pressurePa / (rho * fluid.eos.gasConstantJPerMolK * temperatureK);
}

import type { MoleFractions } from '../../thermo/composition';
import { densityAt, newFluidState, stateAtDensity, type FluidState } from '../../thermo/eos/state';
import type { GasModel } from '../../thermo/gas-model';
import { flashCooler, type CoolerFlash } from '../../thermo/phase';
import { mixtureGas } from '../../thermo/presets';
import { realFluid, type RealEquationId, type RealFluid } from './fluid';
import { humidGasSplit, isHumidLightGas } from './humid-gas';
import { inletPhase } from './phase-check';

/** Below this liquid share (moles per mole of feed) a cooler is taken as dry [cp: beyond any drain's resolution]. */
const MIN_LIQUID_FRACTION = 1e-7;
const MAX_ENTRIES = 2048;
const cache = new Map<string, CoolerFlash | null>();

/**
 * The phase split at a cooler outlet by Peng-Robinson's stability test and flash, or null when nothing
 * condenses. Cached by gas and state: trains and desks repeat the same coolers.
 */
export function coolerSplit(gas: GasModel, temperatureK: number, pressurePa: number): CoolerFlash | null {
  const key = `${gas.key}|${temperatureK}|${pressurePa}`;
  if (cache.has(key)) return cache.get(key)!;
  if (cache.size >= MAX_ENTRIES) cache.clear();
  const split = isHumidLightGas(gas, pressurePa)
    ? humidGasSplit(gas, temperatureK, pressurePa)
    : flashCooler(gas.moleFractions, temperatureK, pressurePa);
  if (!split) {
    cache.set(key, null);
    return null;
  }
  let wet = split.condensate !== null && 1 - split.vapourFraction > MIN_LIQUID_FRACTION;
  // One stable dense phase is a liquid only below its critical region; above it (a pure fluid above Tc, a
  // mixture above its pseudo-critical temperature) it is a dense supercritical fluid that goes on compressing.
  if (wet && split.vapourFraction <= MIN_VAPOUR_FRACTION && split.condensatePhases === null) {
    wet = inletPhase(gas, temperatureK, pressurePa).phase === 'liquid';
  }
  const result = wet ? split : null;
  cache.set(key, result);
  return result;
}

/** Below this vapour share (moles per mole of feed) a cooler condenses the whole stream. */
export const MIN_VAPOUR_FRACTION = 1e-9;

/** An intercooler that condenses the whole stream: the next stage would have no gas to compress. */
export class CoolerFloodedError extends Error {
  readonly stage: number;
  constructor(stage: number, temperatureK: number, pressurePa: number) {
    super(
      `the intercooler after stage ${stage} condenses the whole stream at ${(temperatureK - 273.15).toFixed(1)} °C and ${(pressurePa / 1000).toFixed(0)} kPa, so stage ${stage + 1} would have no gas: raise the intercooler outlet temperature or use fewer stages`,
    );
    this.name = 'CoolerFloodedError';
    this.stage = stage;
  }
}

/** One liquid of a condensate: its share of the condensate moles and its gas model. */
export type CondensateLiquid = { share: number; gas: GasModel };

/** The liquids a split leaves (one, or water and hydrocarbon apart). */
export function condensateLiquids(split: CoolerFlash): CondensateLiquid[] {
  if (split.condensatePhases) {
    return split.condensatePhases.map((ph) => ({
      share: ph.fractionOfCondensate,
      gas: mixtureGas(ph.composition as MoleFractions, 'Condensate'),
    }));
  }
  return [{ share: 1, gas: mixtureGas(split.condensate as MoleFractions, 'Condensate') }];
}

/** The gas leaving a knock-out drum. */
export function vapourGas(split: CoolerFlash): GasModel {
  return mixtureGas(split.vapour as MoleFractions, 'Vapour after knock-out');
}

/** A liquid state of `gas` at (T, p) on the given equation, started from Peng-Robinson's liquid root. */
export function liquidState(
  gas: GasModel,
  id: RealEquationId,
  temperatureK: number,
  pressurePa: number,
): {
  fluid: RealFluid;
  state: FluidState;
} {
  const fluid = realFluid(gas, id);
  const guess = fluid.guide.residual.densityGuess(temperatureK, pressurePa, 'liquid');
  const rho = densityAt(fluid.eos, temperatureK, pressurePa, 'liquid', guess);
  const state = stateAtDensity(fluid.eos, temperatureK, rho, newFluidState());
  state.pressurePa = pressurePa;
  return { fluid, state };
}

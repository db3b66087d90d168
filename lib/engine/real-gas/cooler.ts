import { ZERO_CELSIUS_K } from '../../thermo/constants';
import { EosError } from '../../thermo/eos/eos-error';
import { newFluidState, type FluidState } from '../../thermo/eos/state';
import type { CoolerResult } from '../result-types';
import {
  CoolerFloodedError,
  MIN_VAPOUR_FRACTION,
  condensateLiquids,
  coolerSplit,
  liquidState,
  vapourGas,
} from './condensation';
import { gasState, realFluid, type RealFluid } from './fluid';

export type CooledGas = {
  cooler: Omit<CoolerResult, 'kind'>;
  outletK: number;
  outletPa: number;
  /** The gas leaving the cooler's knock-out: the same fluid when nothing condenses. */
  vapour: RealFluid;
  vapourMassFlowKgPerS: number;
};

function result(
  outletK: number,
  outletPa: number,
  dutyKw: number,
  latentDutyKw: number,
  condensateKgPerH: number,
  condensate: CoolerResult['condensateMoleFractions'],
  vapour: RealFluid,
  vapourMassFlowKgPerS: number,
): CooledGas {
  return {
    cooler: {
      outletTemperatureC: outletK - ZERO_CELSIUS_K,
      outletPressureKpa: outletPa / 1000,
      dutyKw,
      latentDutyKw,
      condensateKgPerH,
      condensateMoleFractions: condensate,
    },
    outletK,
    outletPa,
    vapour,
    vapourMassFlowKgPerS,
  };
}

/**
 * The stream's enthalpy at (T, p) had it stayed a gas: the gas-branch root where one exists (a supersaturated
 * vapour), else the ideal-gas enthalpy there.
 */
function gasEnthalpyOrIdeal(fluid: RealFluid, temperatureK: number, pressurePa: number): number {
  try {
    const s = gasState(fluid, temperatureK, pressurePa, newFluidState());
    if (s.z > VAPOUR_LIKE_Z) return s.enthalpyJPerMol;
  } catch (err) {
    if (!(err instanceof EosError)) throw err;
  }
  return fluid.eos.ideal.h0(temperatureK);
}

/** A gas-branch root this compressible is taken as vapour-like; denser roots are the liquid's [cp]. */
const VAPOUR_LIKE_Z = 0.3;

/**
 * Cools a gas stream to (T, p). Dry: duty = m (h_in - h_out) on the sizing's equation of state. When the
 * outlet lies below the dew point (Peng-Robinson stability test and flash), the outlet is vapour plus
 * condensate, each on the same equation (the condensate on its liquid branch), so the duty carries the latent
 * heat; the condensate leaves at the knock-out and the vapour goes on. The latent part reported is the
 * condensate's ideal-gas enthalpy at the outlet temperature minus its liquid enthalpy.
 */
export function coolGas(
  fluid: RealFluid,
  from: FluidState,
  outletK: number,
  outletPa: number,
  massFlowKgPerS: number,
  stage: number,
  last: boolean,
): CooledGas {
  const split = coolerSplit(fluid.gas, outletK, outletPa);
  const molPerS = massFlowKgPerS / fluid.kgPerMol;
  if (!split) {
    const out = gasState(fluid, outletK, outletPa, newFluidState());
    const dutyKw = (molPerS * (from.enthalpyJPerMol - out.enthalpyJPerMol)) / 1000;
    return result(outletK, outletPa, dutyKw, 0, 0, null, fluid, massFlowKgPerS);
  }
  const beta = split.vapourFraction > MIN_VAPOUR_FRACTION ? split.vapourFraction : 0;
  if (beta === 0 && !last) throw new CoolerFloodedError(stage, outletK, outletPa);
  // The whole stream condensing is a result only for an aftercooler (e.g. carbon dioxide cooled to a liquid).
  const vapour = beta > 0 ? realFluid(vapourGas(split), fluid.id) : fluid;
  const hVapour = beta > 0 ? gasState(vapour, outletK, outletPa, newFluidState()).enthalpyJPerMol : 0;
  let hLiquid = 0;
  let liquidKgPerMol = 0;
  for (const liquid of condensateLiquids(split)) {
    const { fluid: lf, state } = liquidState(liquid.gas, fluid.id, outletK, outletPa);
    hLiquid += liquid.share * state.enthalpyJPerMol;
    liquidKgPerMol += liquid.share * lf.kgPerMol;
  }
  const hOut = beta * hVapour + (1 - beta) * hLiquid;
  const liquidMolPerS = molPerS * (1 - beta);
  const dutyKw = (molPerS * (from.enthalpyJPerMol - hOut)) / 1000;
  // The latent part is what the cooler removes beyond cooling the stream as a gas to the same outlet state.
  const dryKw = (molPerS * (from.enthalpyJPerMol - gasEnthalpyOrIdeal(fluid, outletK, outletPa))) / 1000;
  return result(
    outletK,
    outletPa,
    dutyKw,
    Math.min(Math.max(dutyKw - dryKw, 0), dutyKw),
    liquidMolPerS * liquidKgPerMol * 3600,
    split.condensate as CoolerResult['condensateMoleFractions'],
    vapour,
    molPerS * beta * vapour.kgPerMol,
  );
}

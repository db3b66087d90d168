import { ZERO_CELSIUS_K } from '../../thermo/constants';
import { newFluidState, type FluidState } from '../../thermo/eos/state';
import type { CoolerResult } from '../result-types';
import { condensateLiquids, coolerSplit, liquidState, vapourGas } from './condensation';
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
): CooledGas {
  const split = coolerSplit(fluid.gas, outletK, outletPa);
  const molPerS = massFlowKgPerS / fluid.kgPerMol;
  if (!split) {
    const out = gasState(fluid, outletK, outletPa, newFluidState());
    const dutyKw = (molPerS * (from.enthalpyJPerMol - out.enthalpyJPerMol)) / 1000;
    return result(outletK, outletPa, dutyKw, 0, 0, null, fluid, massFlowKgPerS);
  }
  const beta = split.vapourFraction;
  const vapour = realFluid(vapourGas(split), fluid.id);
  const hVapour = gasState(vapour, outletK, outletPa, newFluidState()).enthalpyJPerMol;
  let hLiquid = 0;
  let liquidKgPerMol = 0;
  let latentPerMol = 0;
  for (const liquid of condensateLiquids(split)) {
    const { fluid: lf, state } = liquidState(liquid.gas, fluid.id, outletK, outletPa);
    hLiquid += liquid.share * state.enthalpyJPerMol;
    liquidKgPerMol += liquid.share * lf.kgPerMol;
    latentPerMol += liquid.share * (lf.eos.ideal.h0(outletK) - state.enthalpyJPerMol);
  }
  const hOut = beta * hVapour + (1 - beta) * hLiquid;
  const liquidMolPerS = molPerS * (1 - beta);
  return result(
    outletK,
    outletPa,
    (molPerS * (from.enthalpyJPerMol - hOut)) / 1000,
    (liquidMolPerS * latentPerMol) / 1000,
    liquidMolPerS * liquidKgPerMol * 3600,
    split.condensate as CoolerResult['condensateMoleFractions'],
    vapour,
    molPerS * beta * vapour.kgPerMol,
  );
}

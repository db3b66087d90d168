import { ZERO_CELSIUS_K } from '../../thermo/constants';
import { newFluidState, type FluidState } from '../../thermo/eos/state';
import type { CoolerResult } from '../result-types';
import { gasState, type RealFluid } from './fluid';

export type CooledGas = {
  cooler: Omit<CoolerResult, 'kind'>;
  outletK: number;
  outletPa: number;
  /** The gas leaving the cooler's knock-out: the same fluid when nothing condenses. */
  vapour: RealFluid;
  vapourMassFlowKgPerS: number;
};

/**
 * Cools a gas stream to (T, p). Duty = m (h_in - h_out) on the sizing's equation of state.
 */
export function coolGas(
  fluid: RealFluid,
  from: FluidState,
  outletK: number,
  outletPa: number,
  massFlowKgPerS: number,
): CooledGas {
  const out = gasState(fluid, outletK, outletPa, newFluidState());
  const dutyKw = (massFlowKgPerS * (from.enthalpyJPerMol - out.enthalpyJPerMol)) / fluid.kgPerMol / 1000;
  return {
    cooler: {
      outletTemperatureC: outletK - ZERO_CELSIUS_K,
      outletPressureKpa: outletPa / 1000,
      dutyKw,
      latentDutyKw: 0,
      condensateKgPerH: 0,
      condensateMoleFractions: null,
    },
    outletK,
    outletPa,
    vapour: fluid,
    vapourMassFlowKgPerS: massFlowKgPerS,
  };
}

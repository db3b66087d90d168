import { ZERO_CELSIUS_K } from '../thermo/constants';
import { M3_PER_FT3 } from '../units/factors';
import type { CompressorStage, CoolerResult } from './result-types';

/** Standard gravity, m/s2, for heads in metres of gas column [pub: CGPM 1901; NIST SP 811]. */
export const STANDARD_GRAVITY = 9.80665;
const M_PER_FT = 0.3048;
const M3_PER_H_PER_ACFM = M3_PER_FT3 * 60;
const KELVIN_OFFSET = ZERO_CELSIUS_K;

/** What every compression method knows about one of its stages, SI units. */
export type StageFigures = {
  stage: number;
  pressureRatio: number;
  inletPa: number;
  dischargePa: number;
  inletK: number;
  dischargeK: number;
  isentropicDischargeK: number;
  massFlowKgPerS: number;
  inletZ: number;
  dischargeZ: number;
  inletDensityKgPerM3: number;
  dischargeDensityKgPerM3: number;
  workJPerKg: number;
  isentropicHeadJPerKg: number;
  polytropicHeadJPerKg: number;
  polytropicExponent: number;
  k: number;
  cpJPerKgK: number;
  cooler: CoolerResult | null;
};

/** One row of a method's stage table: the figures frame and impeller selection work from. */
export function stageRow(f: StageFigures): CompressorStage {
  const inletM3PerH = (3600 * f.massFlowKgPerS) / f.inletDensityKgPerM3;
  return {
    stage: f.stage,
    pressureRatio: f.pressureRatio,
    inletPressureKpa: f.inletPa / 1000,
    dischargePressureKpa: f.dischargePa / 1000,
    inletTemperatureC: f.inletK - KELVIN_OFFSET,
    dischargeTemperatureC: f.dischargeK - KELVIN_OFFSET,
    isentropicDischargeTemperatureC: f.isentropicDischargeK - KELVIN_OFFSET,
    massFlowKgPerS: f.massFlowKgPerS,
    inletZ: f.inletZ,
    dischargeZ: f.dischargeZ,
    inletDensityKgPerM3: f.inletDensityKgPerM3,
    dischargeDensityKgPerM3: f.dischargeDensityKgPerM3,
    inletActualFlowM3PerH: inletM3PerH,
    inletActualFlowAcfm: inletM3PerH / M3_PER_H_PER_ACFM,
    dischargeActualFlowM3PerH: (3600 * f.massFlowKgPerS) / f.dischargeDensityKgPerM3,
    specificWorkKjPerKg: f.workJPerKg / 1000,
    isentropicHeadKjPerKg: f.isentropicHeadJPerKg / 1000,
    polytropicHeadKjPerKg: f.polytropicHeadJPerKg / 1000,
    isentropicHeadM: f.isentropicHeadJPerKg / STANDARD_GRAVITY,
    polytropicHeadM: f.polytropicHeadJPerKg / STANDARD_GRAVITY,
    isentropicHeadFt: f.isentropicHeadJPerKg / STANDARD_GRAVITY / M_PER_FT,
    polytropicHeadFt: f.polytropicHeadJPerKg / STANDARD_GRAVITY / M_PER_FT,
    isentropicEfficiency: f.isentropicHeadJPerKg / f.workJPerKg,
    polytropicEfficiency: f.polytropicHeadJPerKg / f.workJPerKg,
    polytropicExponent: f.polytropicExponent,
    gasPowerKw: (f.massFlowKgPerS * f.workJPerKg) / 1000,
    k: f.k,
    cpJPerKgK: f.cpJPerKgK,
    cooler: f.cooler,
  };
}

/**
 * Polytropic exponent and head of an ideal-gas stage from its end temperatures: (n-1)/n = ln(T2/T1)/ln(r),
 * Hp = n/(n-1) R (T2 - T1) [pub: standard gas-compression texts; ASME PTC 10-1997 with Z = 1].
 */
export function idealPolytropic(
  gasConstantJPerKgK: number,
  inletK: number,
  dischargeK: number,
  ratio: number,
): { n: number; headJPerKg: number } {
  const m = Math.log(dischargeK / inletK) / Math.log(ratio);
  return { n: 1 / (1 - m), headJPerKg: (gasConstantJPerKgK * (dischargeK - inletK)) / m };
}
